import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A message kept by the local SMTP catcher (development and tests only). */
export class DevMessage extends Model<InferAttributes<DevMessage>, InferCreationAttributes<DevMessage>> {
  declare id: CreationOptional<string>;
  declare mailFrom: string;
  declare mailTo: string;
  declare subject: string;
  declare text: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    DevMessage.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        mailFrom: { type: DataTypes.STRING(320), allowNull: false, field: 'mail_from' },
        mailTo: { type: DataTypes.STRING(2000), allowNull: false, field: 'mail_to' },
        subject: { type: DataTypes.STRING(500), allowNull: false },
        text: { type: DataTypes.TEXT, allowNull: false },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, modelName: 'DevMessage', tableName: 'dev_messages', underscored: true, updatedAt: false },
    );
  }
}
