import { DataTypes } from 'sequelize';
import type { Migration } from './types';

export const migration: Migration = {
  name: '20261201002000-create-speaker-profiles',
  async up({ context: q }) {
    await q.createTable('speaker_profiles', {
      id: { type: DataTypes.UUID, primaryKey: true },
      workspace_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
      // A profile outlives the account that made it.
      created_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
      name: { type: DataTypes.STRING(120), allowNull: false },
      kind: { type: DataTypes.ENUM('main', 'sub'), allowNull: false },
      // The profile's fields as `speakerProfileSchema` (lib/validations/system.ts) validates them, without its id.
      document: { type: DataTypes.JSONB, allowNull: false },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
    });
    await q.addIndex('speaker_profiles', ['workspace_id', 'kind', 'name'], { name: 'speaker_profiles_workspace_kind_name' });
  },
  async down({ context: q }) {
    await q.dropTable('speaker_profiles', {});
    await q.sequelize.query('DROP TYPE IF EXISTS "enum_speaker_profiles_kind"');
  },
};
