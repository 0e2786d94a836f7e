/** Submissions, their attachments, linked entries and history (migration 0005). */
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
import type { ClaimedFigureDto, CorrectionSection, Decision, SubmissionKind, SubmissionStatus } from '../../shared/submissions/types';
import { DECISIONS, SUBMISSION_KINDS, SUBMISSION_STATUSES } from '../../shared/submissions/types';
import { User } from './accounts';
import { Entry } from './entries';
import { jsonColumn } from './json';

export class Submission extends Model<InferAttributes<Submission>, InferCreationAttributes<Submission>> {
  declare id: CreationOptional<number>;
  declare kind: SubmissionKind;
  declare status: CreationOptional<SubmissionStatus>;
  declare title: string;
  declare submitterId: ForeignKey<number>;
  declare claimedById: number | null;
  declare claimedAt: Date | null;
  declare seenAtUrl: string | null;
  declare seenAtCitation: string | null;
  declare summary: string | null;
  declare figures: ClaimedFigureDto[] | null;
  declare entryId: number | null;
  declare entryVersion: number | null;
  declare section: CorrectionSection | null;
  declare whatIsWrong: string | null;
  declare suggestedFix: string | null;
  declare sources: string | null;
  declare decision: Decision | null;
  declare decisionNote: string | null;
  declare decidedById: number | null;
  declare decidedAt: Date | null;
  declare draftEntryId: number | null;
  declare moderatorsNotifiedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare submitter?: NonAttribute<User>;
  declare claimedBy?: NonAttribute<User | null>;
  declare decidedBy?: NonAttribute<User | null>;
  declare entry?: NonAttribute<Entry | null>;
  declare draftEntry?: NonAttribute<Entry | null>;
  declare attachments?: NonAttribute<Attachment[]>;
  declare linkedEntries?: NonAttribute<Entry[]>;
  declare events?: NonAttribute<SubmissionEvent[]>;
}

export class Attachment extends Model<InferAttributes<Attachment>, InferCreationAttributes<Attachment>> {
  declare id: CreationOptional<number>;
  declare submissionId: ForeignKey<number>;
  declare storageKey: string;
  declare name: string;
  declare mediaType: string;
  declare size: number;
  declare sha256: string;
  declare createdAt: CreationOptional<Date>;
}

export class SubmissionEntry extends Model<InferAttributes<SubmissionEntry>, InferCreationAttributes<SubmissionEntry>> {
  declare submissionId: number;
  declare entryId: number;
  declare createdAt: CreationOptional<Date>;
}

export class SubmissionEvent extends Model<InferAttributes<SubmissionEvent>, InferCreationAttributes<SubmissionEvent>> {
  declare id: CreationOptional<number>;
  declare submissionId: ForeignKey<number>;
  declare what: string;
  declare actorId: number | null;
  declare note: string | null;
  declare createdAt: CreationOptional<Date>;
  declare actor?: NonAttribute<User | null>;
}

export function initSubmissions(sequelize: Sequelize): void {
  Submission.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      kind: { type: DataTypes.ENUM(...SUBMISSION_KINDS), allowNull: false },
      status: { type: DataTypes.ENUM(...SUBMISSION_STATUSES), allowNull: false, defaultValue: 'open' },
      title: { type: DataTypes.STRING(200), allowNull: false },
      submitterId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      claimedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      claimedAt: { type: DataTypes.DATE, allowNull: true },
      seenAtUrl: { type: DataTypes.STRING(2000), allowNull: true },
      seenAtCitation: { type: DataTypes.TEXT, allowNull: true },
      summary: { type: DataTypes.TEXT, allowNull: true },
      figures: jsonColumn<ClaimedFigureDto[] | null>('figures', true),
      entryId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      entryVersion: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      section: { type: DataTypes.STRING(40), allowNull: true },
      whatIsWrong: { type: DataTypes.TEXT, allowNull: true },
      suggestedFix: { type: DataTypes.TEXT, allowNull: true },
      sources: { type: DataTypes.TEXT, allowNull: true },
      decision: { type: DataTypes.ENUM(...DECISIONS), allowNull: true },
      decisionNote: { type: DataTypes.TEXT, allowNull: true },
      decidedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      decidedAt: { type: DataTypes.DATE, allowNull: true },
      draftEntryId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      moderatorsNotifiedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'submissions', modelName: 'Submission' },
  );
  Attachment.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      submissionId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      storageKey: { type: DataTypes.STRING(200), allowNull: false, unique: true },
      name: { type: DataTypes.STRING(200), allowNull: false },
      mediaType: { type: DataTypes.STRING(40), allowNull: false },
      size: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      sha256: { type: DataTypes.CHAR(64), allowNull: false },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'attachments', modelName: 'Attachment', updatedAt: false },
  );
  SubmissionEntry.init(
    {
      submissionId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
      entryId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'submission_entries', modelName: 'SubmissionEntry', updatedAt: false },
  );
  SubmissionEvent.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      submissionId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      what: { type: DataTypes.STRING(20), allowNull: false },
      actorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      note: { type: DataTypes.TEXT, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'submission_events', modelName: 'SubmissionEvent', updatedAt: false },
  );
  Submission.belongsTo(User, { as: 'submitter', foreignKey: 'submitterId' });
  Submission.belongsTo(User, { as: 'claimedBy', foreignKey: 'claimedById' });
  Submission.belongsTo(User, { as: 'decidedBy', foreignKey: 'decidedById' });
  Submission.belongsTo(Entry, { as: 'entry', foreignKey: 'entryId' });
  Submission.belongsTo(Entry, { as: 'draftEntry', foreignKey: 'draftEntryId' });
  Submission.hasMany(Attachment, { as: 'attachments', foreignKey: 'submissionId' });
  Submission.hasMany(SubmissionEvent, { as: 'events', foreignKey: 'submissionId' });
  Submission.belongsToMany(Entry, { through: SubmissionEntry, as: 'linkedEntries', foreignKey: 'submissionId', otherKey: 'entryId' });
  SubmissionEvent.belongsTo(User, { as: 'actor', foreignKey: 'actorId' });
}
