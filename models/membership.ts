import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export type WorkspaceRole = 'owner' | 'editor' | 'viewer';

export class Membership extends Model<InferAttributes<Membership>, InferCreationAttributes<Membership>> {
  declare id: CreationOptional<string>;
  declare workspaceId: string;
  declare userId: string;
  declare role: WorkspaceRole;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Membership.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        workspaceId: { type: DataTypes.UUID, allowNull: false, field: 'workspace_id' },
        userId: { type: DataTypes.UUID, allowNull: false, field: 'user_id' },
        role: { type: DataTypes.ENUM('owner', 'editor', 'viewer'), allowNull: false },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
        updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
      },
      { sequelize, modelName: 'Membership', tableName: 'memberships', underscored: true },
    );
  }
}
