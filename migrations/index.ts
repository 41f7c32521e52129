import type { Migration } from './types';
import { migration as createUsers } from './20261201000100-create-users';
import { migration as createWorkspaces } from './20261201000200-create-workspaces';
import { migration as createMemberships } from './20261201000300-create-memberships';
import { migration as createSystems } from './20261201000400-create-systems';
import { migration as createSystemRevisions } from './20261201000500-create-system-revisions';
import { migration as createShareLinks } from './20261201000600-create-share-links';
import { migration as createInvitations } from './20261201000700-create-invitations';
import { migration as createPasswordResetTokens } from './20261201000800-create-password-reset-tokens';
import { migration as createRateLimits } from './20261201000900-create-rate-limits';
import { migration as createDevMessages } from './20261201001000-create-dev-messages';
import { migration as createSpeakerProfiles } from './20261201002000-create-speaker-profiles';
import { migration as createMeasurements } from './20261201003000-create-measurements';
import { migration as createLessons } from './20261201004000-create-lessons';
import { migration as createLessonSteps } from './20261201004100-create-lesson-steps';
import { migration as measurementRunsAndImpulses } from './20261202000100-measurement-runs-and-impulses';
import { migration as createAccessTokens } from './20261202000200-create-access-tokens';
import { migration as systemsKeepFormerMembers } from './20261203000500-systems-keep-former-members';

/**
 * Every migration, in the order it runs: by name, which is its file name (a timestamp first), so the order never
 * depends on where an entry sits in this list. umzug records each run by name in `umzug_meta`.
 */
export const migrations: Migration[] = [
  createUsers,
  createWorkspaces,
  createMemberships,
  createSystems,
  createSystemRevisions,
  createShareLinks,
  createInvitations,
  createPasswordResetTokens,
  createRateLimits,
  createDevMessages,
  createSpeakerProfiles,
  createMeasurements,
  createLessons,
  createLessonSteps,
  measurementRunsAndImpulses,
  createAccessTokens,
  systemsKeepFormerMembers,
].sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0));
