import { DataTypes, type Model, type ModelAttributeColumnOptions } from 'sequelize';

/**
 * A JSON column. MariaDB's JSON is LONGTEXT with a json_valid check, and the connector may hand the
 * text back instead of the value: the getter parses it when it does.
 */
export function jsonColumn<T>(name: string, allowNull: boolean): ModelAttributeColumnOptions<Model> {
  return {
    type: DataTypes.JSON,
    allowNull,
    get(this: Model) {
      const raw = this.getDataValue(name) as unknown;
      return (typeof raw === 'string' ? JSON.parse(raw) : raw) as T;
    },
  };
}
