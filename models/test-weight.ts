import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { grams } from './columns';
import { WEIGHT_CLASSES, type WeightClass } from '../lib/metrology/weight-classes';

export class TestWeight extends Model<InferAttributes<TestWeight>, InferCreationAttributes<TestWeight>> {
  declare id: CreationOptional<number>;
  declare identifier: string;
  declare nominalG: string;
  declare weightClass: WeightClass;
  declare certificateNumber: string | null;
  declare certificateFile: string | null;
  declare dueAt: string | null;
  declare active: CreationOptional<boolean>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    TestWeight.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        identifier: { type: DataTypes.STRING(40), allowNull: false, unique: true },
        nominalG: { type: grams(), allowNull: false },
        weightClass: { type: DataTypes.ENUM(...WEIGHT_CLASSES), allowNull: false },
        certificateNumber: { type: DataTypes.STRING(60), allowNull: true },
        certificateFile: { type: DataTypes.STRING(80), allowNull: true },
        dueAt: { type: DataTypes.DATEONLY, allowNull: true },
        active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: { type: DataTypes.DATE, allowNull: false },
        updatedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, modelName: 'TestWeight', tableName: 'test_weights', version: true },
    );
  }
}
