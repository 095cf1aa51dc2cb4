import 'server-only';
import type { Sequelize } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { User } from './User';
import { Tag } from './Tag';
import { Question } from './Question';
import { Answer } from './Answer';
import { QuestionTag } from './QuestionTag';
import { SafetyCheck } from './SafetyCheck';
import { WorkedCalculation } from './WorkedCalculation';
import { Site } from './Site';
import { SiteVersion } from './SiteVersion';
import { IdempotencyKey } from './IdempotencyKey';
import { AuthToken } from './AuthToken';
import { ExpertApplication } from './ExpertApplication';
import { Notice } from './Notice';
import { Reply } from './Reply';
import { Revision } from './Revision';
import { HelpfulMark } from './HelpfulMark';
import { QuestionFollow } from './QuestionFollow';
import { Photo } from './Photo';
import { Flag } from './Flag';
import { Appeal } from './Appeal';
import { AuditEntry } from './AuditEntry';
import { FieldLogEntry } from './FieldLogEntry';
import { FieldLogTrial } from './FieldLogTrial';
import { FieldLogLink } from './FieldLogLink';
import { TagFollow } from './TagFollow';
import { MailMessage } from './MailMessage';

export {
  User,
  Tag,
  Question,
  Answer,
  QuestionTag,
  SafetyCheck,
  WorkedCalculation,
  AuthToken,
  ExpertApplication,
  Notice,
  Reply,
  Revision,
  HelpfulMark,
  QuestionFollow,
  Photo,
  Flag,
  Appeal,
  AuditEntry,
  FieldLogEntry,
  FieldLogTrial,
  FieldLogLink,
  TagFollow,
  MailMessage,
  Site,
  SiteVersion,
  IdempotencyKey,
};

const initialised = new WeakSet<Sequelize>();

/** Initialises every model and association on one Sequelize instance, once. */
export function initModels(sequelize: Sequelize = getSequelize()) {
  if (!initialised.has(sequelize)) {
    User.initModel(sequelize);
    Tag.initModel(sequelize);
    Question.initModel(sequelize);
    Answer.initModel(sequelize);
    QuestionTag.initModel(sequelize);
    SafetyCheck.initModel(sequelize);
    WorkedCalculation.initModel(sequelize);
    AuthToken.initModel(sequelize);
    ExpertApplication.initModel(sequelize);
    Notice.initModel(sequelize);
    Reply.initModel(sequelize);
    Revision.initModel(sequelize);
    HelpfulMark.initModel(sequelize);
    QuestionFollow.initModel(sequelize);
    Photo.initModel(sequelize);
    Flag.initModel(sequelize);
    Appeal.initModel(sequelize);
    AuditEntry.initModel(sequelize);
    FieldLogEntry.initModel(sequelize);
    FieldLogTrial.initModel(sequelize);
    FieldLogLink.initModel(sequelize);
    TagFollow.initModel(sequelize);
    MailMessage.initModel(sequelize);
    Site.initModel(sequelize);
    SiteVersion.initModel(sequelize);
    IdempotencyKey.initModel(sequelize);

    Question.belongsTo(User, { as: 'author', foreignKey: 'authorId' });
    User.hasMany(Question, { as: 'questions', foreignKey: 'authorId' });
    Answer.belongsTo(User, { as: 'author', foreignKey: 'authorId' });
    Answer.belongsTo(Question, { as: 'question', foreignKey: 'questionId' });
    Question.hasMany(Answer, { as: 'answers', foreignKey: 'questionId' });
    Question.belongsToMany(Tag, { through: QuestionTag, as: 'tags', foreignKey: 'questionId', otherKey: 'tagId' });
    Tag.belongsToMany(Question, { through: QuestionTag, as: 'questions', foreignKey: 'tagId', otherKey: 'questionId' });
    SafetyCheck.belongsTo(User, { as: 'expert', foreignKey: 'expertId' });
    WorkedCalculation.belongsTo(User, { as: 'author', foreignKey: 'authorId' });
    ExpertApplication.belongsTo(User, { as: 'applicant', foreignKey: 'userId' });
    Reply.belongsTo(User, { as: 'author', foreignKey: 'authorId' });
    Question.hasMany(Reply, { as: 'replies', foreignKey: 'questionId' });
    Answer.belongsTo(WorkedCalculation, { as: 'calculation', foreignKey: 'calculationId' });
    Revision.belongsTo(User, { as: 'editor', foreignKey: 'editorId' });
    Question.hasMany(Photo, { as: 'photos', foreignKey: 'questionId' });
    Answer.hasMany(Photo, { as: 'photos', foreignKey: 'answerId' });
    Flag.belongsTo(User, { as: 'flagger', foreignKey: 'flaggerId' });
    Appeal.belongsTo(User, { as: 'user', foreignKey: 'userId' });
    AuditEntry.belongsTo(User, { as: 'actor', foreignKey: 'actorId' });
    FieldLogEntry.belongsTo(User, { as: 'author', foreignKey: 'authorId' });
    FieldLogEntry.hasMany(FieldLogTrial, { as: 'trials', foreignKey: 'entryId' });
    Site.belongsTo(User, { as: 'owner', foreignKey: 'ownerId' });
    Site.hasMany(SiteVersion, { as: 'versions', foreignKey: 'siteId' });
    // what was asked, tested or worked out about a site: it stays when the site is deleted (SET NULL)
    Question.belongsTo(Site, { as: 'site', foreignKey: 'siteId', constraints: false });
    FieldLogEntry.belongsTo(Site, { as: 'site', foreignKey: 'siteId', constraints: false });
    WorkedCalculation.belongsTo(Site, { as: 'site', foreignKey: 'siteId', constraints: false });
    initialised.add(sequelize);
  }
  return {
    sequelize,
    User,
    Tag,
    Question,
    Answer,
    QuestionTag,
    SafetyCheck,
    WorkedCalculation,
    AuthToken,
    ExpertApplication,
    Notice,
    Reply,
    Revision,
    HelpfulMark,
    QuestionFollow,
    Photo,
    Flag,
    Appeal,
    AuditEntry,
    FieldLogEntry,
    FieldLogTrial,
    FieldLogLink,
    TagFollow,
    MailMessage,
    Site,
    SiteVersion,
    IdempotencyKey,
  };
}
