import { DataTypes } from 'sequelize';
import type { Migration } from './types';

// Messages kept by the local SMTP catcher; shown on the Dev mailbox page.
export const migration: Migration = {
  name: '20261201001000-create-dev-messages',
  async up({ context: q }) {
    await q.createTable('dev_messages', {
      id: { type: DataTypes.UUID, primaryKey: true },
      mail_from: { type: DataTypes.STRING(320), allowNull: false },
      mail_to: { type: DataTypes.STRING(2000), allowNull: false },
      subject: { type: DataTypes.STRING(500), allowNull: false },
      text: { type: DataTypes.TEXT, allowNull: false },
      created_at: { type: DataTypes.DATE, allowNull: false },
    });
    await q.addIndex('dev_messages', ['created_at'], { name: 'dev_messages_created' });
  },
  async down({ context: q }) {
    await q.dropTable('dev_messages', {});
  },
};
