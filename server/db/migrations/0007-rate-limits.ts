/**
 * Rate-limit counts shared by every app server (issue 13, item 6; server/http/rate-limit.ts): one
 * row per limit and client (`rate_key`: the limit's name, a colon, the address or account), the
 * hits in the current window and when the window ends (`reset_ms`, milliseconds since 1970 on the
 * database's clock). Rows of ended windows are deleted on a timer, hence the index on reset_ms.
 */
import { DataTypes } from 'sequelize';
import type { Migration } from './types';

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('rate_limits', {
    rate_key: { type: DataTypes.STRING(190), allowNull: false, primaryKey: true },
    hits: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    reset_ms: { type: DataTypes.BIGINT, allowNull: false },
  });
  await qi.addIndex('rate_limits', ['reset_ms']);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('rate_limits');
};
