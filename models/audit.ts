import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { AUDIT_STATUSES, AUDIT_VERDICTS, INSPECTION_LEVELS } from '../lib/domain/quality';

export class Audit extends Model<InferAttributes<Audit>, InferCreationAttributes<Audit>> {
  declare id: CreationOptional<number>;
  declare population: unknown;
  declare lotSize: number;
  declare level: (typeof INSPECTION_LEVELS)[number];
  declare aql: string;
  declare codeLetter: string;
  declare sampleSize: number;
  declare accept: number;
  declare reject: number;
  declare seed: number;
  declare status: CreationOptional<(typeof AUDIT_STATUSES)[number]>;
  declare defects: number | null;
  declare verdict: (typeof AUDIT_VERDICTS)[number] | null;
  declare createdBy: number;
  declare closedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Audit.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        population: { type: DataTypes.JSON, allowNull: false },
        lotSize: { type: DataTypes.INTEGER, allowNull: false },
        level: { type: DataTypes.ENUM(...INSPECTION_LEVELS), allowNull: false },
        aql: { type: DataTypes.DECIMAL(6, 3), allowNull: false },
        codeLetter: { type: DataTypes.CHAR(1), allowNull: false },
        sampleSize: { type: DataTypes.INTEGER, allowNull: false },
        accept: { type: DataTypes.INTEGER, allowNull: false },
        reject: { type: DataTypes.INTEGER, allowNull: false },
        seed: { type: DataTypes.BIGINT, allowNull: false },
        status: { type: DataTypes.ENUM(...AUDIT_STATUSES), allowNull: false, defaultValue: 'open' },
        defects: { type: DataTypes.INTEGER, allowNull: true },
        verdict: { type: DataTypes.ENUM(...AUDIT_VERDICTS), allowNull: true },
        createdBy: { type: DataTypes.INTEGER, allowNull: false },
        closedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: { type: DataTypes.DATE, allowNull: false },
        updatedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, modelName: 'Audit', tableName: 'audits' },
    );
  }
}
