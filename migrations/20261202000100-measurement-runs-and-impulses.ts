import { DataTypes } from 'sequelize';
import type { Migration } from './types';

/**
 * Measurements in depth (issue 17): a run label ("treble +2", "after moving the sub"), where the points came from
 * (a text file or an impulse response in a WAV file) and, for an impulse, its sample rate, the window it was read
 * through and the arrival time of its peak. Existing rows read as text uploads without a label.
 */
export const migration: Migration = {
  name: '20261202000100-measurement-runs-and-impulses',
  async up({ context: q }) {
    await q.addColumn('measurements', 'run_label', { type: DataTypes.STRING(80), allowNull: true });
    await q.addColumn('measurements', 'source_format', { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'text' });
    await q.addColumn('measurements', 'sample_rate_hz', { type: DataTypes.INTEGER, allowNull: true });
    await q.addColumn('measurements', 'arrival_ms', { type: DataTypes.DOUBLE, allowNull: true });
    // { startMs, lengthMs, fadeInMs, fadeOutMs } of the window the impulse was transformed through.
    await q.addColumn('measurements', 'impulse_window', { type: DataTypes.JSONB, allowNull: true });
    await q.addIndex('measurements', ['system_id', 'seat', 'role'], { name: 'measurements_system_seat_role' });
  },
  async down({ context: q }) {
    await q.removeIndex('measurements', 'measurements_system_seat_role');
    for (const column of ['impulse_window', 'arrival_ms', 'sample_rate_hz', 'source_format', 'run_label']) await q.removeColumn('measurements', column);
  },
};
