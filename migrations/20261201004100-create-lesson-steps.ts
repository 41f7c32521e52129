import { DataTypes } from 'sequelize';
import type { Migration } from './types';

export const migration: Migration = {
  name: '20261201004100-create-lesson-steps',
  async up({ context: q }) {
    await q.createTable('lesson_steps', {
      id: { type: DataTypes.UUID, primaryKey: true },
      lesson_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'lessons', key: 'id' }, onDelete: 'CASCADE' },
      // 1-based order within the lesson.
      position: { type: DataTypes.INTEGER, allowNull: false },
      title: { type: DataTypes.STRING(200), allowNull: false },
      // Talking points: plain text with a small Markdown subset, rendered without HTML.
      points: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      panel: { type: DataTypes.STRING(20), allowNull: false },
      traces: { type: DataTypes.JSONB, allowNull: false },
      sweep: { type: DataTypes.JSONB, allowNull: true },
      // A copy of the System document (systemDocumentSchema): later edits of the System do not reach it.
      document: { type: DataTypes.JSONB, allowNull: false },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
    });
    // Deferred to the end of the transaction so a reorder can move positions through each other.
    await q.sequelize.query(
      'ALTER TABLE lesson_steps ADD CONSTRAINT lesson_steps_position_unique UNIQUE (lesson_id, position) DEFERRABLE INITIALLY DEFERRED, ADD CONSTRAINT lesson_steps_position_positive CHECK (position >= 1)',
    );
  },
  async down({ context: q }) {
    await q.dropTable('lesson_steps', {});
  },
};
