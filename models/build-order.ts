import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { ORDER_STATUSES, type OrderStatus } from '../lib/domain/orders';

export class BuildOrder extends Model<InferAttributes<BuildOrder>, InferCreationAttributes<BuildOrder>> {
  declare id: CreationOptional<number>;
  declare number: string;
  declare kitId: number;
  declare quantity: number;
  declare dueDate: string | null;
  declare status: CreationOptional<OrderStatus>;
  declare createdBy: number;
  declare releasedAt: Date | null;
  declare completedAt: Date | null;
  declare cancelledAt: Date | null;
  declare overrideReason: string | null;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    BuildOrder.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        number: { type: DataTypes.STRING(20), allowNull: false, unique: true },
        kitId: { type: DataTypes.INTEGER, allowNull: false },
        quantity: { type: DataTypes.INTEGER, allowNull: false },
        dueDate: { type: DataTypes.DATEONLY, allowNull: true },
        status: { type: DataTypes.ENUM(...ORDER_STATUSES), allowNull: false, defaultValue: 'draft' },
        createdBy: { type: DataTypes.INTEGER, allowNull: false },
        releasedAt: { type: DataTypes.DATE, allowNull: true },
        completedAt: { type: DataTypes.DATE, allowNull: true },
        cancelledAt: { type: DataTypes.DATE, allowNull: true },
        overrideReason: { type: DataTypes.STRING(500), allowNull: true },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: { type: DataTypes.DATE, allowNull: false },
        updatedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, modelName: 'BuildOrder', tableName: 'build_orders', version: true },
    );
  }
}
