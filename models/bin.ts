import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { ABC_CLASSES, type AbcClass } from '../lib/domain/stock';

export class Bin extends Model<InferAttributes<Bin>, InferCreationAttributes<Bin>> {
  declare id: CreationOptional<number>;
  declare code: string;
  declare partId: number;
  declare containerId: number | null;
  declare bookQuantity: number;
  declare abcClass: CreationOptional<AbcClass>;
  declare lastCountedAt: Date | null;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Bin.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        code: { type: DataTypes.STRING(20), allowNull: false, unique: true },
        partId: { type: DataTypes.INTEGER, allowNull: false },
        containerId: { type: DataTypes.INTEGER, allowNull: true },
        bookQuantity: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        abcClass: { type: DataTypes.ENUM(...ABC_CLASSES), allowNull: false, defaultValue: 'C' },
        lastCountedAt: { type: DataTypes.DATE, allowNull: true },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: { type: DataTypes.DATE, allowNull: false },
        updatedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, modelName: 'Bin', tableName: 'bins', version: true },
    );
  }
}
