import { DataTypes } from 'sequelize';
import type { Migration } from './types';

export const migration: Migration = {
  name: '20261201000300-create-memberships',
  async up({ context: q }) {
    await q.createTable('memberships', {
      id: { type: DataTypes.UUID, primaryKey: true },
      // A workspace's memberships go with it; deleting a user removes their memberships.
      workspace_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
      user_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
      role: { type: DataTypes.ENUM('owner', 'editor', 'viewer'), allowNull: false },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
    });
    await q.addIndex('memberships', ['workspace_id', 'user_id'], { unique: true, name: 'memberships_workspace_user' });
    await q.addIndex('memberships', ['user_id'], { name: 'memberships_user' });
  },
  async down({ context: q }) {
    await q.dropTable('memberships', {});
    await q.sequelize.query('DROP TYPE IF EXISTS "enum_memberships_role"');
  },
};
