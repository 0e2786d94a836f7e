/** The taxonomy that every entry hangs on: conservation laws and the mechanism-class tree. */
import { DataTypes } from 'sequelize';
import type { Migration } from './types';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('conservation_laws', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(160), allowNull: false },
    quantity: { type: DataTypes.STRING(160), allowNull: false },
    symmetry: { type: DataTypes.STRING(200), allowNull: true },
    summary: { type: DataTypes.TEXT, allowNull: false },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    ...timestamps,
  });
  await qi.createTable('mechanism_classes', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(160), allowNull: false },
    parent_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: true,
      references: { model: 'mechanism_classes', key: 'id' },
      onDelete: 'RESTRICT',
    },
    summary: { type: DataTypes.TEXT, allowNull: false },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    ...timestamps,
  });
  await qi.addIndex('mechanism_classes', ['parent_id', 'position']);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('mechanism_classes');
  await qi.dropTable('conservation_laws');
};
