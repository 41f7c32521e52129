import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { WorkspaceRole } from './membership';

export class Invitation extends Model<InferAttributes<Invitation>, InferCreationAttributes<Invitation>> {
  declare id: CreationOptional<string>;
  declare workspaceId: string;
  declare email: string;
  declare role: WorkspaceRole;
  /** SHA-256 of the token that was e-mailed; the token itself is never stored. */
  declare tokenHash: string;
  declare invitedById: string | null;
  declare expiresAt: Date;
  declare acceptedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Invitation.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        workspaceId: { type: DataTypes.UUID, allowNull: false, field: 'workspace_id' },
        email: { type: DataTypes.STRING(254), allowNull: false },
        role: { type: DataTypes.ENUM('owner', 'editor', 'viewer'), allowNull: false },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true, field: 'token_hash' },
        invitedById: { type: DataTypes.UUID, allowNull: true, field: 'invited_by_id' },
        expiresAt: { type: DataTypes.DATE, allowNull: false, field: 'expires_at' },
        acceptedAt: { type: DataTypes.DATE, allowNull: true, field: 'accepted_at' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, modelName: 'Invitation', tableName: 'invitations', underscored: true, updatedAt: false },
    );
  }
}
