import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** The stored points of a measurement, exactly as parsed. */
export interface MeasurementData {
  frequencyHz: number[];
  magnitudeDb: number[];
  phaseDeg: number[] | null;
}

/** The window an impulse response was transformed through (ms from the file's first sample). */
export interface ImpulseWindowRecord {
  startMs: number;
  lengthMs: number;
  fadeInMs: number;
  fadeOutMs: number;
}

/** Where a measurement's points came from. */
export type MeasurementSourceFormat = 'text' | 'wav';

/** An uploaded measured response (frequency, magnitude, optional phase) in a workspace's Library. */
export class Measurement extends Model<InferAttributes<Measurement>, InferCreationAttributes<Measurement>> {
  declare id: CreationOptional<string>;
  declare workspaceId: string;
  declare systemId: string | null;
  declare createdById: string | null;
  declare name: string;
  declare seat: string | null;
  declare role: string | null;
  declare pointCount: number;
  declare startHz: number;
  declare stopHz: number;
  declare hasPhase: boolean;
  declare data: MeasurementData;
  /** A label telling runs of the same seat and source apart ("treble +2", "after moving the sub"). */
  declare runLabel: string | null;
  declare sourceFormat: CreationOptional<MeasurementSourceFormat>;
  /** An impulse response's sample rate, its peak's arrival (ms from the file's first sample) and window; null for text. */
  declare sampleRateHz: number | null;
  declare arrivalMs: number | null;
  declare impulseWindow: ImpulseWindowRecord | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Measurement.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        workspaceId: { type: DataTypes.UUID, allowNull: false, field: 'workspace_id' },
        systemId: { type: DataTypes.UUID, allowNull: true, field: 'system_id' },
        createdById: { type: DataTypes.UUID, allowNull: true, field: 'created_by_id' },
        name: { type: DataTypes.STRING(120), allowNull: false },
        seat: { type: DataTypes.STRING(60), allowNull: true },
        role: { type: DataTypes.STRING(20), allowNull: true },
        pointCount: { type: DataTypes.INTEGER, allowNull: false, field: 'point_count' },
        startHz: { type: DataTypes.DOUBLE, allowNull: false, field: 'start_hz' },
        stopHz: { type: DataTypes.DOUBLE, allowNull: false, field: 'stop_hz' },
        hasPhase: { type: DataTypes.BOOLEAN, allowNull: false, field: 'has_phase' },
        data: { type: DataTypes.JSONB, allowNull: false },
        runLabel: { type: DataTypes.STRING(80), allowNull: true, field: 'run_label' },
        sourceFormat: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'text', field: 'source_format' },
        sampleRateHz: { type: DataTypes.INTEGER, allowNull: true, field: 'sample_rate_hz' },
        arrivalMs: { type: DataTypes.DOUBLE, allowNull: true, field: 'arrival_ms' },
        impulseWindow: { type: DataTypes.JSONB, allowNull: true, field: 'impulse_window' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
        updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
      },
      { sequelize, modelName: 'Measurement', tableName: 'measurements', underscored: true },
    );
  }
}
