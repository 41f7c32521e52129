import { DataTypes } from 'sequelize';
import type { Migration } from './types';

/** Personal access tokens: a user's named keys for programs, each for one workspace, read or write; only a hash is kept. */
export const migration: Migration = {
  name: '20261202000200-create-access-tokens',
  async up({ context: q }) {
    await q.createTable('access_tokens', {
      id: { type: DataTypes.UUID, primaryKey: true },
      user_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
      workspace_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
      name: { type: DataTypes.STRING(80), allowNull: false },
      scope: { type: DataTypes.ENUM('read', 'write'), allowNull: false },
      token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
      hint: { type: DataTypes.STRING(16), allowNull: false },
      expires_at: { type: DataTypes.DATE, allowNull: true },
      last_used_at: { type: DataTypes.DATE, allowNull: true },
      revoked_at: { type: DataTypes.DATE, allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
    });
    await q.addIndex('access_tokens', ['user_id'], { name: 'access_tokens_user' });
  },
  async down({ context: q }) {
    await q.dropTable('access_tokens', {});
    await q.sequelize.query('DROP TYPE IF EXISTS "enum_access_tokens_scope"');
  },
};
