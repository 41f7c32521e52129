import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export type SpeakerProfileKind = 'main' | 'sub';

/** A workspace's reusable main-speaker or subwoofer description (the Library's Speaker profiles). */
export class SpeakerProfileRow extends Model<InferAttributes<SpeakerProfileRow>, InferCreationAttributes<SpeakerProfileRow>> {
  declare id: CreationOptional<string>;
  declare workspaceId: string;
  declare createdById: string | null;
  declare name: string;
  declare kind: SpeakerProfileKind;
  /** The profile's fields (roll-offs, sensitivity, power, impedance, notes), validated on the way in and out. */
  declare document: unknown;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    SpeakerProfileRow.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        workspaceId: { type: DataTypes.UUID, allowNull: false, field: 'workspace_id' },
        createdById: { type: DataTypes.UUID, allowNull: true, field: 'created_by_id' },
        name: { type: DataTypes.STRING(120), allowNull: false },
        kind: { type: DataTypes.ENUM('main', 'sub'), allowNull: false },
        document: { type: DataTypes.JSONB, allowNull: false },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
        updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
      },
      { sequelize, modelName: 'SpeakerProfile', tableName: 'speaker_profiles', underscored: true },
    );
  }
}
