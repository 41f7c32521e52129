import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class System extends Model<InferAttributes<System>, InferCreationAttributes<System>> {
  declare id: CreationOptional<string>;
  declare workspaceId: string;
  /** Null once that account is deleted (the System stays, shown as by "a former member"). */
  declare ownerId: string | null;
  declare lastEditorId: string | null;
  declare name: string;
  declare document: unknown;
  declare revision: CreationOptional<number>;
  declare tags: CreationOptional<string[]>;
  declare deletedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    System.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        workspaceId: { type: DataTypes.UUID, allowNull: false, field: 'workspace_id' },
        ownerId: { type: DataTypes.UUID, allowNull: true, field: 'owner_id' },
        lastEditorId: { type: DataTypes.UUID, allowNull: true, field: 'last_editor_id' },
        name: { type: DataTypes.STRING(200), allowNull: false },
        document: { type: DataTypes.JSONB, allowNull: false },
        revision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        tags: { type: DataTypes.ARRAY(DataTypes.STRING(40)), allowNull: false, defaultValue: [] },
        deletedAt: { type: DataTypes.DATE, allowNull: true, field: 'deleted_at' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
        updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
      },
      // Soft delete is explicit (deletedAt set by the data layer) so restore and purge stay visible.
      { sequelize, modelName: 'System', tableName: 'systems', underscored: true },
    );
  }
}
