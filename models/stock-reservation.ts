import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { RESERVATION_STATUSES, type ReservationStatus } from '../lib/domain/orders';

export class StockReservation extends Model<InferAttributes<StockReservation>, InferCreationAttributes<StockReservation>> {
  declare id: CreationOptional<number>;
  declare orderLineId: number;
  declare partId: number;
  declare quantity: number;
  declare status: CreationOptional<ReservationStatus>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    StockReservation.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        orderLineId: { type: DataTypes.INTEGER, allowNull: false, unique: true },
        partId: { type: DataTypes.INTEGER, allowNull: false },
        quantity: { type: DataTypes.INTEGER, allowNull: false },
        status: { type: DataTypes.ENUM(...RESERVATION_STATUSES), allowNull: false, defaultValue: 'active' },
        createdAt: { type: DataTypes.DATE, allowNull: false },
        updatedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, modelName: 'StockReservation', tableName: 'stock_reservations' },
    );
  }
}
