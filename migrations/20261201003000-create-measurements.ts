import { DataTypes } from 'sequelize';
import type { Migration } from './types';

export const migration: Migration = {
  name: '20261201003000-create-measurements',
  async up({ context: q }) {
    await q.createTable('measurements', {
      id: { type: DataTypes.UUID, primaryKey: true },
      workspace_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
      // A measurement outlives the System it was taken for and the account that uploaded it.
      system_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'systems', key: 'id' }, onDelete: 'SET NULL' },
      created_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
      name: { type: DataTypes.STRING(120), allowNull: false },
      seat: { type: DataTypes.STRING(60), allowNull: true },
      role: { type: DataTypes.STRING(20), allowNull: true },
      point_count: { type: DataTypes.INTEGER, allowNull: false },
      start_hz: { type: DataTypes.DOUBLE, allowNull: false },
      stop_hz: { type: DataTypes.DOUBLE, allowNull: false },
      has_phase: { type: DataTypes.BOOLEAN, allowNull: false },
      // Every point as parsed: { frequencyHz: [...], magnitudeDb: [...], phaseDeg: [...] | null } (JSON numbers round-trip exactly).
      data: { type: DataTypes.JSONB, allowNull: false },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
    });
    await q.addIndex('measurements', ['workspace_id', 'created_at'], { name: 'measurements_workspace_created' });
    await q.addIndex('measurements', ['system_id'], { name: 'measurements_system' });
  },
  async down({ context: q }) {
    await q.dropTable('measurements', {});
  },
};
