import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

// One row (id 1) of shop-wide defaults.
export class SiteSettings extends Model<InferAttributes<SiteSettings>, InferCreationAttributes<SiteSettings>> {
  declare id: CreationOptional<number>;
  declare siteName: string;
  declare displayUnit: string;
  declare defaultPieceSpread: string;
  declare stabilityWindowMs: number;
  declare varianceThresholdPct: string;
  declare varianceThresholdPcs: number;
  /** The bench hides a bin's book quantity from its counter until the count is in. */
  declare blindCycleCounts: CreationOptional<boolean>;
  /** IANA zone the shop keeps its days in; null follows the server's zone. */
  declare timeZone: CreationOptional<string | null>;
  /** A session ends this many hours after sign-in however busy it is (one shift). */
  declare sessionHours: CreationOptional<number>;
  /** Whoever counted a variance cannot approve or reject it. */
  declare fourEyesVariances: CreationOptional<boolean>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    SiteSettings.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true },
        siteName: { type: DataTypes.STRING(120), allowNull: false },
        displayUnit: { type: DataTypes.STRING(4), allowNull: false },
        defaultPieceSpread: { type: DataTypes.DECIMAL(6, 4), allowNull: false },
        stabilityWindowMs: { type: DataTypes.INTEGER, allowNull: false },
        varianceThresholdPct: { type: DataTypes.DECIMAL(6, 2), allowNull: false },
        varianceThresholdPcs: { type: DataTypes.INTEGER, allowNull: false },
        blindCycleCounts: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        timeZone: { type: DataTypes.STRING(64), allowNull: true },
        sessionHours: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 12 },
        fourEyesVariances: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: { type: DataTypes.DATE, allowNull: false },
        updatedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, modelName: 'SiteSettings', tableName: 'site_settings', version: true },
    );
  }
}
