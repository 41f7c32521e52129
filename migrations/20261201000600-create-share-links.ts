import { DataTypes } from 'sequelize';
import type { Migration } from './types';

export const migration: Migration = {
  name: '20261201000600-create-share-links',
  async up({ context: q }) {
    await q.createTable('share_links', {
      id: { type: DataTypes.UUID, primaryKey: true },
      token: { type: DataTypes.STRING(64), allowNull: false, unique: true },
      target_type: { type: DataTypes.ENUM('system', 'lesson'), allowNull: false },
      target_id: { type: DataTypes.UUID, allowNull: false },
      workspace_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
      created_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
      revoked_at: { type: DataTypes.DATE, allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
    });
    await q.addIndex('share_links', ['target_type', 'target_id'], { name: 'share_links_target' });
  },
  async down({ context: q }) {
    await q.dropTable('share_links', {});
    await q.sequelize.query('DROP TYPE IF EXISTS "enum_share_links_target_type"');
  },
};
