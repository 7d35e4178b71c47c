import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

// Per-part totals: on hand (the sum of its bins' book quantities) and reserved by released orders.
export class PartStock extends Model<InferAttributes<PartStock>, InferCreationAttributes<PartStock>> {
  declare partId: number;
  declare onHand: number;
  declare reserved: number;

  static initModel(sequelize: Sequelize): void {
    PartStock.init(
      {
        partId: { type: DataTypes.INTEGER, primaryKey: true },
        onHand: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        reserved: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      },
      { sequelize, modelName: 'PartStock', tableName: 'part_stock', timestamps: false },
    );
  }
}
