import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export type ShareTarget = 'system' | 'lesson';

export class ShareLink extends Model<InferAttributes<ShareLink>, InferCreationAttributes<ShareLink>> {
  declare id: CreationOptional<string>;
  /** base64url of 32 random bytes (256 bits) from the CSPRNG. */
  declare token: string;
  declare targetType: ShareTarget;
  declare targetId: string;
  declare workspaceId: string;
  declare createdById: string | null;
  declare revokedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    ShareLink.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        token: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        targetType: { type: DataTypes.ENUM('system', 'lesson'), allowNull: false, field: 'target_type' },
        targetId: { type: DataTypes.UUID, allowNull: false, field: 'target_id' },
        workspaceId: { type: DataTypes.UUID, allowNull: false, field: 'workspace_id' },
        createdById: { type: DataTypes.UUID, allowNull: true, field: 'created_by_id' },
        revokedAt: { type: DataTypes.DATE, allowNull: true, field: 'revoked_at' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, modelName: 'ShareLink', tableName: 'share_links', underscored: true, updatedAt: false },
    );
  }
}
