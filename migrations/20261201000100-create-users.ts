import { DataTypes } from 'sequelize';
import type { Migration } from './types';

export const migration: Migration = {
  name: '20261201000100-create-users',
  async up({ context: q }) {
    await q.createTable('users', {
      id: { type: DataTypes.UUID, primaryKey: true },
      email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
      name: { type: DataTypes.STRING(120), allowNull: false },
      password_hash: { type: DataTypes.STRING(100), allowNull: false },
      site_role: { type: DataTypes.ENUM('admin', 'member'), allowNull: false, defaultValue: 'member' },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
    });
  },
  async down({ context: q }) {
    await q.dropTable('users', {});
    await q.sequelize.query('DROP TYPE IF EXISTS "enum_users_site_role"');
  },
};
