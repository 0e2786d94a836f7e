/**
 * Accounts: users, their sessions (the express-session store, shared by every app server), the
 * single-use tokens of e-mailed links (only their SHA-256 is kept), the append-only audit log and
 * the development outbox (messages caught by the local fake SMTP server).
 */
import { DataTypes } from 'sequelize';
import type { Migration } from './types';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('users', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    display_name: { type: DataTypes.STRING(80), allowNull: false },
    password_hash: { type: DataTypes.STRING(255), allowNull: false },
    role: {
      type: DataTypes.ENUM('contributor', 'editor', 'moderator', 'admin'),
      allowNull: false,
      defaultValue: 'contributor',
    },
    email_verified_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('users', ['role']);
  await qi.addIndex('users', ['created_at', 'id']);

  // The columns connect-session-sequelize reads and writes (sid, expires, data), plus the user, so
  // that a password reset can end every session of that user. Created here, never by store.sync().
  await qi.createTable('sessions', {
    sid: { type: DataTypes.STRING(128), primaryKey: true, allowNull: false },
    expires: { type: DataTypes.DATE, allowNull: true },
    data: { type: DataTypes.TEXT, allowNull: true },
    user_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    ...timestamps,
  });
  await qi.addIndex('sessions', ['expires']);
  await qi.addIndex('sessions', ['user_id']);

  await qi.createTable('email_tokens', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    user_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    purpose: { type: DataTypes.ENUM('verify', 'reset'), allowNull: false },
    /** SHA-256 of the token, hex; the token itself exists only in the e-mail. */
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('email_tokens', ['user_id', 'purpose']);
  await qi.addIndex('email_tokens', ['expires_at']);

  await qi.createTable('audit_events', {
    id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
    actor_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'RESTRICT',
    },
    action: { type: DataTypes.STRING(80), allowNull: false },
    subject_type: { type: DataTypes.STRING(40), allowNull: false },
    subject_id: { type: DataTypes.STRING(64), allowNull: false },
    before: { type: DataTypes.JSON, allowNull: true },
    after: { type: DataTypes.JSON, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  // Newest first, overall and per record.
  await qi.addIndex('audit_events', ['created_at', 'id']);
  await qi.addIndex('audit_events', ['subject_type', 'subject_id', 'created_at']);
  await qi.addIndex('audit_events', ['actor_id', 'created_at']);

  await qi.createTable('dev_outbox', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    to: { type: DataTypes.STRING(1000), allowNull: false },
    from: { type: DataTypes.STRING(1000), allowNull: false },
    subject: { type: DataTypes.STRING(1000), allowNull: false },
    text: { type: DataTypes.TEXT('medium'), allowNull: false },
    html: { type: DataTypes.TEXT('medium'), allowNull: false },
    received_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('dev_outbox', ['received_at', 'id']);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('dev_outbox');
  await qi.dropTable('audit_events');
  await qi.dropTable('email_tokens');
  await qi.dropTable('sessions');
  await qi.dropTable('users');
};
