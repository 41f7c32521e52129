import { DataTypes } from 'sequelize';
import type { Migration } from './types';

export const migration: Migration = {
  name: '20261201000400-create-systems',
  async up({ context: q }) {
    await q.createTable('systems', {
      id: { type: DataTypes.UUID, primaryKey: true },
      workspace_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
      // A user who still owns or last edited Systems cannot be deleted until they are handed over.
      owner_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
      last_editor_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
      name: { type: DataTypes.STRING(200), allowNull: false },
      document: { type: DataTypes.JSONB, allowNull: false },
      revision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      tags: { type: DataTypes.ARRAY(DataTypes.STRING(40)), allowNull: false, defaultValue: [] },
      deleted_at: { type: DataTypes.DATE, allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
    });
    await q.addIndex('systems', ['workspace_id', 'deleted_at', 'updated_at'], { name: 'systems_workspace_live' });
    await q.addIndex('systems', ['tags'], { using: 'GIN', name: 'systems_tags' });
  },
  async down({ context: q }) {
    await q.dropTable('systems', {});
  },
};
