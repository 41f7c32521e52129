import type { Sequelize } from 'sequelize';
import { DevMessage } from './dev-message';
import { Invitation } from './invitation';
import { Membership } from './membership';
import { PasswordResetToken } from './password-reset-token';
import { ShareLink } from './share-link';
import { System } from './system';
import { SystemRevision } from './system-revision';
import { User } from './user';
import { Workspace } from './workspace';
import { SpeakerProfileRow } from './speaker-profile';
import { Lesson } from './lesson';
import { LessonStep } from './lesson-step';
import { Measurement } from './measurement';
import { AccessToken } from './access-token';

export { DevMessage, Invitation, Membership, PasswordResetToken, ShareLink, System, SystemRevision, User, Workspace };
export type { SiteRole } from './user';
export type { WorkspaceRole } from './membership';
export { SpeakerProfileRow };

export { Lesson, LessonStep };

export { Measurement };
export { AccessToken };
export type { TokenScope } from './access-token';
export type { MeasurementData } from './measurement';

// Per module instance: bundlers may load this module more than once around one shared Sequelize.
let initialisedWith: Sequelize | null = null;

/** Registers every model and association on one Sequelize instance (idempotent). */
export function initModels(sequelize: Sequelize): void {
  if (initialisedWith === sequelize) return;
  initialisedWith = sequelize;
  for (const model of [User, Workspace, Membership, System, SystemRevision, ShareLink, Invitation, PasswordResetToken, DevMessage]) {
    model.initModel(sequelize);
  }
  Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  Membership.belongsTo(Workspace, { foreignKey: 'workspaceId', as: 'workspace' });
  Workspace.hasMany(Membership, { foreignKey: 'workspaceId', as: 'memberships' });
  User.hasMany(Membership, { foreignKey: 'userId', as: 'memberships' });
  System.belongsTo(Workspace, { foreignKey: 'workspaceId', as: 'workspace' });
  System.belongsTo(User, { foreignKey: 'ownerId', as: 'owner' });
  System.belongsTo(User, { foreignKey: 'lastEditorId', as: 'lastEditor' });
  SystemRevision.belongsTo(System, { foreignKey: 'systemId', as: 'system' });
  SystemRevision.belongsTo(User, { foreignKey: 'authorId', as: 'author' });
  Invitation.belongsTo(Workspace, { foreignKey: 'workspaceId', as: 'workspace' });
  PasswordResetToken.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  SpeakerProfileRow.initModel(sequelize);
  SpeakerProfileRow.belongsTo(Workspace, { foreignKey: 'workspaceId', as: 'workspace' });
  SpeakerProfileRow.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });
  Lesson.initModel(sequelize);
  LessonStep.initModel(sequelize);
  Lesson.belongsTo(Workspace, { foreignKey: 'workspaceId', as: 'workspace' });
  Lesson.belongsTo(User, { foreignKey: 'ownerId', as: 'owner' });
  Lesson.belongsTo(User, { foreignKey: 'lastEditorId', as: 'lastEditor' });
  Lesson.hasMany(LessonStep, { foreignKey: 'lessonId', as: 'steps' });
  LessonStep.belongsTo(Lesson, { foreignKey: 'lessonId', as: 'lesson' });
  Measurement.initModel(sequelize);
  Measurement.belongsTo(Workspace, { foreignKey: 'workspaceId', as: 'workspace' });
  Measurement.belongsTo(System, { foreignKey: 'systemId', as: 'system' });
  Measurement.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });
  AccessToken.initModel(sequelize);
  AccessToken.belongsTo(Workspace, { foreignKey: 'workspaceId', as: 'workspace' });
  AccessToken.belongsTo(User, { foreignKey: 'userId', as: 'user' });
}
