import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export const SESSION_END_REASONS = ['signed_out', 'signed_out_everywhere', 'ended_by_admin', 'password_changed', 'switched_off', 'role_changed'] as const;
export type SessionEndReason = (typeof SESSION_END_REASONS)[number];

// One signed-in browser. The cookie holds a random id; only its SHA-256 is stored, so a copy of
// this table cannot be replayed. A session counts until it is ended, idles out or reaches expiresAt.
export class UserSession extends Model<InferAttributes<UserSession>, InferCreationAttributes<UserSession>> {
  declare id: CreationOptional<number>;
  declare tokenHash: string;
  declare userId: number;
  declare lastSeenAt: Date;
  /** The absolute end, fixed when the session starts (the site's session lifetime then). */
  declare expiresAt: Date;
  declare endedAt: Date | null;
  declare endReason: SessionEndReason | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    UserSession.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        lastSeenAt: { type: DataTypes.DATE, allowNull: false },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        endedAt: { type: DataTypes.DATE, allowNull: true },
        endReason: { type: DataTypes.ENUM(...SESSION_END_REASONS), allowNull: true },
        createdAt: { type: DataTypes.DATE, allowNull: false },
        updatedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, modelName: 'UserSession', tableName: 'user_sessions' },
    );
  }
}
