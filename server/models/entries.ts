/**
 * Entries and their versions. A version is mutable while it is a draft or in review; once published
 * it never changes: the hooks below refuse every update or delete of a published version (and the
 * database's own triggers, migration 0003, refuse them too).
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
} from 'sequelize';
import type { EntryContent } from '../../shared/entries/schema';
import { User } from './accounts';
import { jsonColumn } from './json';
import { ConservationLaw, MechanismClass } from './taxonomy';

export const ENTRY_STATUSES = ['draft', 'in_review', 'published', 'retired'] as const;
export type EntryStatus = (typeof ENTRY_STATUSES)[number];
export const VERSION_STATES = ['draft', 'in_review', 'published', 'superseded'] as const;
export type VersionState = (typeof VERSION_STATES)[number];

export class Entry extends Model<InferAttributes<Entry>, InferCreationAttributes<Entry>> {
  declare id: CreationOptional<number>;
  declare slug: string;
  declare title: string;
  declare status: CreationOptional<EntryStatus>;
  declare mechanismClassId: ForeignKey<number> | null;
  declare currentVersionId: ForeignKey<number> | null;
  declare lastPublishedAt: Date | null;
  declare retiredReason: string | null;
  declare successorId: ForeignKey<number> | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare currentVersion?: NonAttribute<EntryVersion | null>;
  declare mechanismClass?: NonAttribute<MechanismClass | null>;
  declare successor?: NonAttribute<Entry | null>;
  declare laws?: NonAttribute<ConservationLaw[]>;
}

export class EntryVersion extends Model<InferAttributes<EntryVersion>, InferCreationAttributes<EntryVersion>> {
  declare id: CreationOptional<number>;
  declare entryId: ForeignKey<number>;
  declare number: number | null;
  declare state: CreationOptional<VersionState>;
  declare basedOnId: number | null;
  declare content: EntryContent;
  declare changeNote: string | null;
  declare reviewNote: string | null;
  declare authorId: ForeignKey<number>;
  declare reviewerId: ForeignKey<number> | null;
  declare lockVersion: CreationOptional<number>;
  declare submittedAt: Date | null;
  declare publishedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare entry?: NonAttribute<Entry>;
  declare author?: NonAttribute<User>;
  declare reviewer?: NonAttribute<User | null>;
}

export class EntryLaw extends Model<InferAttributes<EntryLaw>, InferCreationAttributes<EntryLaw>> {
  declare entryId: number;
  declare lawId: number;
}

export class PublishedVersionImmutable extends Error {
  override readonly name = 'PublishedVersionImmutable';
}

const refuseIfPublished = (v: EntryVersion) => {
  // The state as it was read from the database: a row that was published stays as it is.
  const was = (v.previous('state') as VersionState | undefined) ?? v.getDataValue('state');
  if (!v.isNewRecord && was === 'published') {
    throw new PublishedVersionImmutable(`version ${v.number ?? '?'} of entry ${v.entryId} is published and cannot be changed or deleted`);
  }
};

export function initEntries(sequelize: Sequelize): void {
  Entry.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
      title: { type: DataTypes.STRING(160), allowNull: false },
      status: { type: DataTypes.ENUM(...ENTRY_STATUSES), allowNull: false, defaultValue: 'draft' },
      mechanismClassId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      currentVersionId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      lastPublishedAt: { type: DataTypes.DATE, allowNull: true },
      retiredReason: { type: DataTypes.TEXT, allowNull: true },
      successorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'entries', modelName: 'Entry' },
  );
  EntryVersion.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      entryId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      number: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      state: { type: DataTypes.ENUM(...VERSION_STATES), allowNull: false, defaultValue: 'draft' },
      basedOnId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      content: jsonColumn<EntryContent>('content', false),
      changeNote: { type: DataTypes.STRING(500), allowNull: true },
      reviewNote: { type: DataTypes.TEXT, allowNull: true },
      authorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      reviewerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      lockVersion: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
      submittedAt: { type: DataTypes.DATE, allowNull: true },
      publishedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    {
      sequelize,
      tableName: 'entry_versions',
      modelName: 'EntryVersion',
      hooks: {
        beforeUpdate: refuseIfPublished,
        beforeDestroy: refuseIfPublished,
        // Bulk writes run the per-row hooks above, so that no published row slips through.
        beforeBulkUpdate: (options) => {
          options.individualHooks = true;
        },
        beforeBulkDestroy: (options) => {
          options.individualHooks = true;
        },
        beforeUpsert: () => {
          throw new PublishedVersionImmutable('entry versions are never upserted');
        },
      },
    },
  );
  EntryLaw.init(
    {
      entryId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true },
      lawId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true },
    },
    { sequelize, tableName: 'entry_laws', modelName: 'EntryLaw', timestamps: false },
  );

  Entry.belongsTo(EntryVersion, { as: 'currentVersion', foreignKey: 'currentVersionId', constraints: false });
  Entry.belongsTo(MechanismClass, { as: 'mechanismClass', foreignKey: 'mechanismClassId' });
  Entry.belongsTo(Entry, { as: 'successor', foreignKey: 'successorId' });
  Entry.hasMany(EntryVersion, { as: 'versions', foreignKey: 'entryId' });
  Entry.belongsToMany(ConservationLaw, { through: EntryLaw, as: 'laws', foreignKey: 'entryId', otherKey: 'lawId' });
  EntryVersion.belongsTo(Entry, { as: 'entry', foreignKey: 'entryId' });
  EntryVersion.belongsTo(User, { as: 'author', foreignKey: 'authorId' });
  EntryVersion.belongsTo(User, { as: 'reviewer', foreignKey: 'reviewerId' });
}
