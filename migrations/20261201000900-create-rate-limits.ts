import { DataTypes } from 'sequelize';
import type { Migration } from './types';

// The table rate-limiter-flexible's RateLimiterPostgres expects, so limits hold across app instances.
export const migration: Migration = {
  name: '20261201000900-create-rate-limits',
  async up({ context: q }) {
    await q.createTable('rate_limits', {
      key: { type: DataTypes.STRING(255), primaryKey: true },
      points: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      expire: { type: DataTypes.BIGINT, allowNull: true },
    });
  },
  async down({ context: q }) {
    await q.dropTable('rate_limits', {});
  },
};
