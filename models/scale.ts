import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { grams } from './columns';
import { ACCURACY_CLASSES, type AccuracyClass } from '../lib/metrology/accuracy-class';
import { SCALE_STATUSES, type ScaleStatus } from '../lib/domain/scales';

export class Scale extends Model<InferAttributes<Scale>, InferCreationAttributes<Scale>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare location: string | null;
  declare capacityG: string;
  declare minLoadG: string;
  declare divisionG: string;
  declare verificationIntervalG: string;
  declare accuracyClass: AccuracyClass;
  declare repeatabilityG: string | null;
  declare connection: unknown;
  declare status: CreationOptional<ScaleStatus>;
  declare statusReason: string | null;
  declare calibrationDueAt: string | null;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Scale.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        name: { type: DataTypes.STRING(80), allowNull: false, unique: true },
        location: { type: DataTypes.STRING(120), allowNull: true },
        capacityG: { type: grams(), allowNull: false },
        minLoadG: { type: grams(), allowNull: false },
        divisionG: { type: grams(), allowNull: false },
        verificationIntervalG: { type: grams(), allowNull: false },
        accuracyClass: { type: DataTypes.ENUM(...ACCURACY_CLASSES), allowNull: false },
        repeatabilityG: { type: grams(), allowNull: true },
        connection: { type: DataTypes.JSON, allowNull: false },
        status: { type: DataTypes.ENUM(...SCALE_STATUSES), allowNull: false, defaultValue: 'in_service' },
        statusReason: { type: DataTypes.STRING(300), allowNull: true },
        calibrationDueAt: { type: DataTypes.DATEONLY, allowNull: true },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: { type: DataTypes.DATE, allowNull: false },
        updatedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, modelName: 'Scale', tableName: 'scales', version: true },
    );
  }
}
