import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { LINE_VERDICTS, type LineVerdict } from '../lib/domain/orders';

export class BuildOrderLine extends Model<InferAttributes<BuildOrderLine>, InferCreationAttributes<BuildOrderLine>> {
  declare id: CreationOptional<number>;
  declare orderId: number;
  declare partId: number;
  declare quantityPerKit: number;
  declare required: number;
  declare toleranceBelow: number;
  declare toleranceAbove: number;
  declare counted: CreationOptional<number>;
  // u² of the line's count (pieces²), captures that share an APW counted together.
  declare varianceSum: CreationOptional<string>;
  /** ± whole pieces at 95 %; 0 when every capture was exact. */
  declare wholePieceRange: CreationOptional<number>;
  /** Sent back for a recount: only captures after this event count for the line. */
  declare recountAfterEventId: CreationOptional<number | null>;
  declare captures: CreationOptional<number>;
  declare verdict: CreationOptional<LineVerdict>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    BuildOrderLine.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        orderId: { type: DataTypes.INTEGER, allowNull: false },
        partId: { type: DataTypes.INTEGER, allowNull: false },
        quantityPerKit: { type: DataTypes.INTEGER, allowNull: false },
        required: { type: DataTypes.INTEGER, allowNull: false },
        toleranceBelow: { type: DataTypes.INTEGER, allowNull: false },
        toleranceAbove: { type: DataTypes.INTEGER, allowNull: false },
        counted: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        varianceSum: { type: DataTypes.DECIMAL(16, 6), allowNull: false, defaultValue: 0 },
        wholePieceRange: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        recountAfterEventId: { type: DataTypes.INTEGER, allowNull: true },
        captures: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        verdict: { type: DataTypes.ENUM(...LINE_VERDICTS), allowNull: false, defaultValue: 'open' },
        createdAt: { type: DataTypes.DATE, allowNull: false },
        updatedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, modelName: 'BuildOrderLine', tableName: 'build_order_lines' },
    );
  }
}
