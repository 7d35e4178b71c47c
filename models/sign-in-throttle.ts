import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

// Failed sign-ins per key ("account:<email>" or "address:<ip>") in a rolling window.
// Kept in the database so every app instance sees the same counts.
export class SignInThrottle extends Model<InferAttributes<SignInThrottle>, InferCreationAttributes<SignInThrottle>> {
  declare scopeKey: string;
  declare failures: number;
  declare windowStart: Date;
  declare blockedUntil: Date | null;

  static initModel(sequelize: Sequelize): void {
    SignInThrottle.init(
      {
        scopeKey: { type: DataTypes.STRING(300), primaryKey: true },
        failures: { type: DataTypes.INTEGER, allowNull: false },
        windowStart: { type: DataTypes.DATE, allowNull: false },
        blockedUntil: { type: DataTypes.DATE, allowNull: true },
      },
      { sequelize, modelName: 'SignInThrottle', tableName: 'sign_in_throttles', timestamps: false },
    );
  }
}
