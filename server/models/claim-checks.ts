/** A saved claim check (migration 0004): the pasted text, what was sent back, and the result. */
import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { ClaimCheckResult, FigureInput } from '../../shared/claims/types';
import type { CitationStyle } from '../../shared/entries/citations';
import { User } from './accounts';
import { jsonColumn } from './json';


export class SavedClaimCheck extends Model<InferAttributes<SavedClaimCheck>, InferCreationAttributes<SavedClaimCheck>> {
  declare id: CreationOptional<number>;
  declare token: string;
  declare ownerId: ForeignKey<number>;
  declare text: string;
  declare style: CitationStyle;
  declare figures: FigureInput[] | null;
  declare result: ClaimCheckResult;
  declare topMatch: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initClaimChecks(sequelize: Sequelize): void {
  SavedClaimCheck.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      token: { type: DataTypes.STRING(43), allowNull: false, unique: true },
      ownerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      text: { type: DataTypes.TEXT('medium'), allowNull: false },
      style: { type: DataTypes.STRING(16), allowNull: false },
      figures: jsonColumn<FigureInput[] | null>('figures', true),
      result: jsonColumn<ClaimCheckResult>('result', false),
      topMatch: { type: DataTypes.STRING(160), allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'saved_claim_checks', modelName: 'SavedClaimCheck' },
  );
  SavedClaimCheck.belongsTo(User, { as: 'owner', foreignKey: 'ownerId' });
}
