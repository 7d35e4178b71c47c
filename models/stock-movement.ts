import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { MOVEMENT_REASONS, type MovementReason } from '../lib/domain/stock';

// Append-only: every change of a bin's book quantity, with why and what caused it.
export class StockMovement extends Model<InferAttributes<StockMovement>, InferCreationAttributes<StockMovement>> {
  declare id: CreationOptional<number>;
  declare partId: number;
  declare binId: number | null;
  declare delta: number;
  declare reason: MovementReason;
  declare refType: string | null;
  declare refId: number | null;
  declare note: string | null;
  declare createdBy: number;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    StockMovement.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        partId: { type: DataTypes.INTEGER, allowNull: false },
        binId: { type: DataTypes.INTEGER, allowNull: true },
        delta: { type: DataTypes.INTEGER, allowNull: false },
        reason: { type: DataTypes.ENUM(...MOVEMENT_REASONS), allowNull: false },
        refType: { type: DataTypes.STRING(30), allowNull: true },
        refId: { type: DataTypes.INTEGER, allowNull: true },
        note: { type: DataTypes.STRING(300), allowNull: true },
        createdBy: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, modelName: 'StockMovement', tableName: 'stock_movements', updatedAt: false },
    );
  }
}
