import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class SystemRevision extends Model<InferAttributes<SystemRevision>, InferCreationAttributes<SystemRevision>> {
  declare id: CreationOptional<string>;
  declare systemId: string;
  declare revision: number;
  declare name: string;
  declare document: unknown;
  declare authorId: string | null;
  declare note: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    SystemRevision.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        systemId: { type: DataTypes.UUID, allowNull: false, field: 'system_id' },
        revision: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.STRING(200), allowNull: false },
        document: { type: DataTypes.JSONB, allowNull: false },
        authorId: { type: DataTypes.UUID, allowNull: true, field: 'author_id' },
        note: { type: DataTypes.STRING(200), allowNull: true },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, modelName: 'SystemRevision', tableName: 'system_revisions', underscored: true, updatedAt: false },
    );
  }
}
