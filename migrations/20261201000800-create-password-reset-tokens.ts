import { DataTypes } from 'sequelize';
import type { Migration } from './types';

export const migration: Migration = {
  name: '20261201000800-create-password-reset-tokens',
  async up({ context: q }) {
    await q.createTable('password_reset_tokens', {
      id: { type: DataTypes.UUID, primaryKey: true },
      user_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
      token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
      expires_at: { type: DataTypes.DATE, allowNull: false },
      used_at: { type: DataTypes.DATE, allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
    });
    await q.addIndex('password_reset_tokens', ['user_id'], { name: 'password_reset_tokens_user' });
  },
  async down({ context: q }) {
    await q.dropTable('password_reset_tokens', {});
  },
};
