import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { VERIFICATION_STAGES } from '../lib/domain/scales';

export class CalibrationRecord extends Model<InferAttributes<CalibrationRecord>, InferCreationAttributes<CalibrationRecord>> {
  declare id: CreationOptional<number>;
  declare scaleId: number;
  declare stage: (typeof VERIFICATION_STAGES)[number];
  declare performedAt: string;
  declare performedBy: number;
  declare test: unknown;
  declare verdict: unknown;
  declare testWeightIds: number[];
  declare weightsAdequate: boolean;
  declare pass: boolean;
  declare nextDueAt: string | null;
  declare notes: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    CalibrationRecord.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        scaleId: { type: DataTypes.INTEGER, allowNull: false },
        stage: { type: DataTypes.ENUM(...VERIFICATION_STAGES), allowNull: false },
        performedAt: { type: DataTypes.DATEONLY, allowNull: false },
        performedBy: { type: DataTypes.INTEGER, allowNull: false },
        test: { type: DataTypes.JSON, allowNull: false },
        verdict: { type: DataTypes.JSON, allowNull: false },
        testWeightIds: { type: DataTypes.JSON, allowNull: false },
        weightsAdequate: { type: DataTypes.BOOLEAN, allowNull: false },
        pass: { type: DataTypes.BOOLEAN, allowNull: false },
        nextDueAt: { type: DataTypes.DATEONLY, allowNull: true },
        notes: { type: DataTypes.STRING(1000), allowNull: true },
        createdAt: { type: DataTypes.DATE, allowNull: false },
        updatedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, modelName: 'CalibrationRecord', tableName: 'calibration_records' },
    );
  }
}
