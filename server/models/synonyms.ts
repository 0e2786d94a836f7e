/** The trade's synonym groups and their phrases (migration 0006). */
import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';

export class SynonymGroup extends Model<InferAttributes<SynonymGroup>, InferCreationAttributes<SynonymGroup>> {
  declare id: CreationOptional<number>;
  /** What the group is about, for editors (optional). */
  declare note: string | null;
  /** 1 when created, one more on every edit. */
  declare version: CreationOptional<number>;
  declare position: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare phrases?: NonAttribute<SynonymPhrase[]>;
}

export class SynonymPhrase extends Model<InferAttributes<SynonymPhrase>, InferCreationAttributes<SynonymPhrase>> {
  declare id: CreationOptional<number>;
  declare groupId: ForeignKey<number>;
  /** As the editor wrote it. */
  declare phrase: string;
  /** Its words as the matcher compares them (server/search/synonyms.ts phraseKey); unique over all groups. */
  declare matchKey: string;
  declare position: number;
}

export function initSynonyms(sequelize: Sequelize): void {
  SynonymGroup.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      note: { type: DataTypes.STRING(500), allowNull: true },
      version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
      position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'synonym_groups', modelName: 'SynonymGroup' },
  );
  SynonymPhrase.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      groupId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      phrase: { type: DataTypes.STRING(80), allowNull: false },
      matchKey: { type: DataTypes.STRING(190), allowNull: false, unique: true },
      position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    },
    { sequelize, tableName: 'synonym_phrases', modelName: 'SynonymPhrase', timestamps: false },
  );
  SynonymGroup.hasMany(SynonymPhrase, { as: 'phrases', foreignKey: 'groupId', onDelete: 'CASCADE' });
  SynonymPhrase.belongsTo(SynonymGroup, { as: 'group', foreignKey: 'groupId' });
}
