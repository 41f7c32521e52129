import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export type TokenScope = 'read' | 'write';

/** A personal access token: the secret is shown once; only its SHA-256 (`tokenHash`) and a short hint are kept. */
export class AccessToken extends Model<InferAttributes<AccessToken>, InferCreationAttributes<AccessToken>> {
  declare id: CreationOptional<string>;
  declare userId: string;
  declare workspaceId: string;
  declare name: string;
  declare scope: TokenScope;
  declare tokenHash: string;
  /** The first characters of the secret, to tell tokens apart in the list (never enough to use one). */
  declare hint: string;
  declare expiresAt: Date | null;
  declare lastUsedAt: CreationOptional<Date | null>;
  declare revokedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    AccessToken.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        userId: { type: DataTypes.UUID, allowNull: false, field: 'user_id' },
        workspaceId: { type: DataTypes.UUID, allowNull: false, field: 'workspace_id' },
        name: { type: DataTypes.STRING(80), allowNull: false },
        scope: { type: DataTypes.ENUM('read', 'write'), allowNull: false },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true, field: 'token_hash' },
        hint: { type: DataTypes.STRING(16), allowNull: false },
        expiresAt: { type: DataTypes.DATE, allowNull: true, field: 'expires_at' },
        lastUsedAt: { type: DataTypes.DATE, allowNull: true, field: 'last_used_at' },
        revokedAt: { type: DataTypes.DATE, allowNull: true, field: 'revoked_at' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, modelName: 'AccessToken', tableName: 'access_tokens', underscored: true, updatedAt: false },
    );
  }
}
