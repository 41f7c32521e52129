import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** One Step of a Lesson: a System snapshot with a title, talking points, a panel, traces and an optional sweep. */
export class LessonStep extends Model<InferAttributes<LessonStep>, InferCreationAttributes<LessonStep>> {
  declare id: CreationOptional<string>;
  declare lessonId: string;
  declare position: number;
  declare title: string;
  declare points: CreationOptional<string>;
  declare panel: string;
  declare traces: unknown;
  declare sweep: unknown;
  declare document: unknown;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    LessonStep.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        lessonId: { type: DataTypes.UUID, allowNull: false, field: 'lesson_id' },
        position: { type: DataTypes.INTEGER, allowNull: false },
        title: { type: DataTypes.STRING(200), allowNull: false },
        points: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        panel: { type: DataTypes.STRING(20), allowNull: false },
        traces: { type: DataTypes.JSONB, allowNull: false },
        sweep: { type: DataTypes.JSONB, allowNull: true },
        document: { type: DataTypes.JSONB, allowNull: false },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
        updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
      },
      { sequelize, modelName: 'LessonStep', tableName: 'lesson_steps', underscored: true },
    );
  }
}
