import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A trainer's ordered deck of System snapshots (its Steps are LessonStep rows). */
export class Lesson extends Model<InferAttributes<Lesson>, InferCreationAttributes<Lesson>> {
  declare id: CreationOptional<string>;
  declare workspaceId: string;
  declare ownerId: string | null;
  declare lastEditorId: string | null;
  declare title: string;
  declare description: CreationOptional<string>;
  declare revision: CreationOptional<number>;
  declare deletedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Lesson.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        workspaceId: { type: DataTypes.UUID, allowNull: false, field: 'workspace_id' },
        ownerId: { type: DataTypes.UUID, allowNull: true, field: 'owner_id' },
        lastEditorId: { type: DataTypes.UUID, allowNull: true, field: 'last_editor_id' },
        title: { type: DataTypes.STRING(200), allowNull: false },
        description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        revision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        deletedAt: { type: DataTypes.DATE, allowNull: true, field: 'deleted_at' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
        updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
      },
      // Soft delete is explicit (deletedAt set by the data layer), as for Systems.
      { sequelize, modelName: 'Lesson', tableName: 'lessons', underscored: true },
    );
  }
}
