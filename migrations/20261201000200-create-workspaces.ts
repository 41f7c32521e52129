import { DataTypes } from 'sequelize';
import type { Migration } from './types';

export const migration: Migration = {
  name: '20261201000200-create-workspaces',
  async up({ context: q }) {
    await q.createTable('workspaces', {
      id: { type: DataTypes.UUID, primaryKey: true },
      name: { type: DataTypes.STRING(120), allowNull: false },
      personal: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
    });
  },
  async down({ context: q }) {
    await q.dropTable('workspaces', {});
  },
};
