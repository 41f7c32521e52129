import { DataTypes } from 'sequelize';
import type { Migration } from './types';

export const migration: Migration = {
  name: '20261201000500-create-system-revisions',
  async up({ context: q }) {
    await q.createTable('system_revisions', {
      id: { type: DataTypes.UUID, primaryKey: true },
      system_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'systems', key: 'id' }, onDelete: 'CASCADE' },
      revision: { type: DataTypes.INTEGER, allowNull: false },
      name: { type: DataTypes.STRING(200), allowNull: false },
      document: { type: DataTypes.JSONB, allowNull: false },
      // History survives its author's account.
      author_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
      note: { type: DataTypes.STRING(200), allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
    });
    // One row per revision number: a second writer of the same revision fails here at the latest.
    await q.addIndex('system_revisions', ['system_id', 'revision'], { unique: true, name: 'system_revisions_system_revision' });
  },
  async down({ context: q }) {
    await q.dropTable('system_revisions', {});
  },
};
