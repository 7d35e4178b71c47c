import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { pieceWeight, ratio } from './columns';
import { COUNTING_METHODS, type CountingMethod } from '../lib/domain/counting';

export class Part extends Model<InferAttributes<Part>, InferCreationAttributes<Part>> {
  declare id: CreationOptional<number>;
  declare partNumber: string;
  declare description: string;
  declare countingMethod: CreationOptional<CountingMethod>;
  // Learned from samples: the latest APW and the piece-weight spread c (σ/μ).
  declare apwG: string | null;
  declare apwSampleSize: number | null;
  declare pieceSpread: string | null;
  declare spreadObservations: CreationOptional<number>;
  // The spread as observed (relative scatter, the noise in it, degrees of freedom): see lib/weighing/spread-belief.ts.
  declare spreadScatter: CreationOptional<number | null>;
  declare spreadNoise: CreationOptional<number | null>;
  declare spreadDof: CreationOptional<number | null>;
  declare photoFile: string | null;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Part.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        partNumber: { type: DataTypes.STRING(40), allowNull: false, unique: true },
        description: { type: DataTypes.STRING(200), allowNull: false },
        countingMethod: { type: DataTypes.ENUM(...COUNTING_METHODS), allowNull: false, defaultValue: 'scale' },
        apwG: { type: pieceWeight(), allowNull: true },
        apwSampleSize: { type: DataTypes.INTEGER, allowNull: true },
        pieceSpread: { type: ratio(), allowNull: true },
        spreadObservations: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        spreadScatter: { type: DataTypes.DOUBLE, allowNull: true },
        spreadNoise: { type: DataTypes.DOUBLE, allowNull: true },
        spreadDof: { type: DataTypes.INTEGER, allowNull: true },
        photoFile: { type: DataTypes.STRING(80), allowNull: true },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: { type: DataTypes.DATE, allowNull: false },
        updatedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, modelName: 'Part', tableName: 'parts', version: true },
    );
  }
}
