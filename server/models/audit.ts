/**
 * The append-only audit log: who did what to which record, when, with the record's state before
 * and after. Rows are only ever inserted; the model refuses updates and deletes.
 */
import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
  type Transaction,
} from 'sequelize';
import type { AuditEventDto } from '../../shared/api-types';
import { User } from './accounts';

export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<number>;
  declare actorId: ForeignKey<number> | null;
  /** `<subject type>.<what happened>`, e.g. `user.role_changed`. */
  declare action: string;
  declare subjectType: string;
  declare subjectId: string;
  declare before: unknown;
  declare after: unknown;
  declare createdAt: CreationOptional<Date>;
  declare actor?: NonAttribute<User | null>;

  toDto(): Omit<AuditEventDto, 'sentence'> {
    return {
      id: Number(this.id),
      at: this.createdAt.toISOString(),
      actor: this.actor ? { id: this.actor.id, displayName: this.actor.displayName } : null,
      action: this.action,
      subjectType: this.subjectType,
      subjectId: this.subjectId,
      before: this.before ?? null,
      after: this.after ?? null,
    };
  }
}

const appendOnly = () => {
  throw new Error('audit events are append-only: they cannot be changed or deleted');
};

export function initAudit(sequelize: Sequelize): void {
  AuditEvent.init(
    {
      id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
      actorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      action: { type: DataTypes.STRING(80), allowNull: false },
      subjectType: { type: DataTypes.STRING(40), allowNull: false },
      subjectId: { type: DataTypes.STRING(64), allowNull: false },
      before: { type: DataTypes.JSON, allowNull: true },
      after: { type: DataTypes.JSON, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    {
      sequelize,
      tableName: 'audit_events',
      modelName: 'AuditEvent',
      updatedAt: false,
      hooks: {
        beforeUpdate: appendOnly,
        beforeBulkUpdate: appendOnly,
        beforeDestroy: appendOnly,
        beforeBulkDestroy: appendOnly,
        beforeUpsert: appendOnly,
      },
    },
  );
  AuditEvent.belongsTo(User, { as: 'actor', foreignKey: 'actorId' });
}

/** Writes one audit event inside the caller's transaction. */
export function audit(
  transaction: Transaction,
  e: { actorId: number | null; action: string; subjectType: string; subjectId: string | number; before?: unknown; after?: unknown },
): Promise<AuditEvent> {
  return AuditEvent.create(
    {
      actorId: e.actorId,
      action: e.action,
      subjectType: e.subjectType,
      subjectId: String(e.subjectId),
      before: e.before ?? null,
      after: e.after ?? null,
    },
    { transaction },
  );
}
