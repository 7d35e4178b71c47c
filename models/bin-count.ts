import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { BIN_COUNT_STATUSES, type BinCountStatus } from '../lib/domain/stock';

// A cycle count of one bin: what the book said, what the scale counted, and what was decided.
export class BinCount extends Model<InferAttributes<BinCount>, InferCreationAttributes<BinCount>> {
  declare id: CreationOptional<number>;
  declare binId: number;
  declare countEventId: number;
  declare bookQuantity: number;
  declare counted: number;
  declare variance: number;
  declare status: BinCountStatus;
  declare decidedBy: number | null;
  declare decidedAt: Date | null;
  declare note: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    BinCount.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        binId: { type: DataTypes.INTEGER, allowNull: false },
        countEventId: { type: DataTypes.INTEGER, allowNull: false, unique: true },
        bookQuantity: { type: DataTypes.INTEGER, allowNull: false },
        counted: { type: DataTypes.INTEGER, allowNull: false },
        variance: { type: DataTypes.INTEGER, allowNull: false },
        status: { type: DataTypes.ENUM(...BIN_COUNT_STATUSES), allowNull: false },
        decidedBy: { type: DataTypes.INTEGER, allowNull: true },
        decidedAt: { type: DataTypes.DATE, allowNull: true },
        note: { type: DataTypes.STRING(300), allowNull: true },
        createdAt: { type: DataTypes.DATE, allowNull: false },
        updatedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, modelName: 'BinCount', tableName: 'bin_counts' },
    );
  }
}
