import type { Migration } from './types';

/**
 * Leaving safely (issue 19): a System outlives the account that created or last saved it. Its owner and last editor
 * become nullable and are set to NULL when that account is deleted (shown as "a former member"), as revisions', Lessons',
 * profiles' and measurements' authors already are. Before, deleting such an account was refused (RESTRICT).
 */
export const migration: Migration = {
  name: '20261203000500-systems-keep-former-members',
  async up({ context: q }) {
    await q.sequelize.query(`
      ALTER TABLE systems
        ALTER COLUMN owner_id DROP NOT NULL,
        ALTER COLUMN last_editor_id DROP NOT NULL,
        DROP CONSTRAINT systems_owner_id_fkey,
        DROP CONSTRAINT systems_last_editor_id_fkey,
        ADD CONSTRAINT systems_owner_id_fkey FOREIGN KEY (owner_id) REFERENCES users (id) ON DELETE SET NULL,
        ADD CONSTRAINT systems_last_editor_id_fkey FOREIGN KEY (last_editor_id) REFERENCES users (id) ON DELETE SET NULL`);
  },
  async down({ context: q }) {
    // Refused by PostgreSQL while a System has lost its owner or last editor to a deleted account: nothing to put back.
    await q.sequelize.query(`
      ALTER TABLE systems
        DROP CONSTRAINT systems_owner_id_fkey,
        DROP CONSTRAINT systems_last_editor_id_fkey,
        ADD CONSTRAINT systems_owner_id_fkey FOREIGN KEY (owner_id) REFERENCES users (id) ON DELETE RESTRICT,
        ADD CONSTRAINT systems_last_editor_id_fkey FOREIGN KEY (last_editor_id) REFERENCES users (id) ON DELETE RESTRICT,
        ALTER COLUMN owner_id SET NOT NULL,
        ALTER COLUMN last_editor_id SET NOT NULL`);
  },
};
