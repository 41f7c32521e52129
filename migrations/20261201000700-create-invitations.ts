import { DataTypes } from 'sequelize';
import type { Migration } from './types';

export const migration: Migration = {
  name: '20261201000700-create-invitations',
  async up({ context: q }) {
    await q.createTable('invitations', {
      id: { type: DataTypes.UUID, primaryKey: true },
      workspace_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
      email: { type: DataTypes.STRING(254), allowNull: false },
      role: { type: DataTypes.ENUM('owner', 'editor', 'viewer'), allowNull: false },
      token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
      invited_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
      expires_at: { type: DataTypes.DATE, allowNull: false },
      accepted_at: { type: DataTypes.DATE, allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
    });
    await q.addIndex('invitations', ['workspace_id', 'email'], { name: 'invitations_workspace_email' });
  },
  async down({ context: q }) {
    await q.dropTable('invitations', {});
    await q.sequelize.query('DROP TYPE IF EXISTS "enum_invitations_role"');
  },
};
