import { DataTypes } from 'sequelize';
import type { Migration } from './types';

export const migration: Migration = {
  name: '20261201004000-create-lessons',
  async up({ context: q }) {
    await q.createTable('lessons', {
      id: { type: DataTypes.UUID, primaryKey: true },
      workspace_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
      // SET NULL, not RESTRICT: a Lesson is the workspace's class material, so it outlives the trainer
      // account that wrote it (a departed trainer must not block deleting the account, nor take the
      // course with them). Systems differ: they are a client's record and are handed over first.
      owner_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
      last_editor_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
      title: { type: DataTypes.STRING(200), allowNull: false },
      description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      // Every change (the lesson's fields or any of its Steps) adds one; a write names the one it started from.
      revision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      deleted_at: { type: DataTypes.DATE, allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
    });
    await q.addIndex('lessons', ['workspace_id', 'deleted_at', 'updated_at'], { name: 'lessons_workspace_live' });
  },
  async down({ context: q }) {
    await q.dropTable('lessons', {});
  },
};
