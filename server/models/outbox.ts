/** The development outbox: every message the local fake SMTP server accepted. */
import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { OutboxMessageDto } from '../../shared/api-types';

export class OutboxMessage extends Model<InferAttributes<OutboxMessage>, InferCreationAttributes<OutboxMessage>> {
  declare id: CreationOptional<number>;
  declare to: string;
  declare from: string;
  declare subject: string;
  declare text: string;
  declare html: string;
  declare receivedAt: Date;

  toDto(): OutboxMessageDto {
    return {
      id: this.id,
      to: this.to,
      from: this.from,
      subject: this.subject,
      text: this.text,
      html: this.html,
      receivedAt: this.receivedAt.toISOString(),
    };
  }
}

export function initOutbox(sequelize: Sequelize): void {
  OutboxMessage.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      to: { type: DataTypes.STRING(1000), allowNull: false },
      from: { type: DataTypes.STRING(1000), allowNull: false },
      subject: { type: DataTypes.STRING(1000), allowNull: false },
      text: { type: DataTypes.TEXT('medium'), allowNull: false },
      html: { type: DataTypes.TEXT('medium'), allowNull: false },
      receivedAt: { type: DataTypes.DATE, allowNull: false },
    },
    { sequelize, tableName: 'dev_outbox', modelName: 'OutboxMessage', timestamps: false },
  );
}
