import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export class ConservationLaw extends Model<InferAttributes<ConservationLaw>, InferCreationAttributes<ConservationLaw>> {
  declare id: CreationOptional<number>;
  declare slug: string;
  declare name: string;
  declare quantity: string;
  declare symmetry: string | null;
  declare summary: string;
  declare position: CreationOptional<number>;
}

export class MechanismClass extends Model<InferAttributes<MechanismClass>, InferCreationAttributes<MechanismClass>> {
  declare id: CreationOptional<number>;
  declare slug: string;
  declare name: string;
  declare parentId: ForeignKey<number> | null;
  declare summary: string;
  declare position: CreationOptional<number>;
}

export function initTaxonomy(sequelize: Sequelize): void {
  ConservationLaw.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
      name: { type: DataTypes.STRING(160), allowNull: false },
      quantity: { type: DataTypes.STRING(160), allowNull: false },
      symmetry: { type: DataTypes.STRING(200), allowNull: true },
      summary: { type: DataTypes.TEXT, allowNull: false },
      position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    },
    { sequelize, tableName: 'conservation_laws' },
  );
  MechanismClass.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
      name: { type: DataTypes.STRING(160), allowNull: false },
      parentId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      summary: { type: DataTypes.TEXT, allowNull: false },
      position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    },
    { sequelize, tableName: 'mechanism_classes' },
  );
  MechanismClass.belongsTo(MechanismClass, { as: 'parent', foreignKey: 'parentId' });
}
