import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { grams, pieceWeight } from './columns';
import { SAMPLE_STATUSES, type SampleStatus } from '../lib/domain/counting';

// History of samples per part: what was weighed, and the piece increments when built piece by piece.
export class PieceWeightSample extends Model<InferAttributes<PieceWeightSample>, InferCreationAttributes<PieceWeightSample>> {
  declare id: CreationOptional<number>;
  declare partId: number;
  declare scaleId: number;
  declare quantity: number;
  declare netWeightG: string;
  declare apwG: string;
  declare incrementsG: number[] | null;
  declare createdBy: number;
  declare status: CreationOptional<SampleStatus>;
  declare holdReason: CreationOptional<string | null>;
  /** Variance of the sample's net weight on its scale (g²), for learning the spread across samples. */
  declare netVarianceG2: CreationOptional<number | null>;
  declare decidedBy: CreationOptional<number | null>;
  declare decidedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    PieceWeightSample.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        partId: { type: DataTypes.INTEGER, allowNull: false },
        scaleId: { type: DataTypes.INTEGER, allowNull: false },
        quantity: { type: DataTypes.INTEGER, allowNull: false },
        netWeightG: { type: grams(), allowNull: false },
        apwG: { type: pieceWeight(), allowNull: false },
        incrementsG: { type: DataTypes.JSON, allowNull: true },
        createdBy: { type: DataTypes.INTEGER, allowNull: false },
        status: { type: DataTypes.ENUM(...SAMPLE_STATUSES), allowNull: false, defaultValue: 'accepted' },
        holdReason: { type: DataTypes.STRING(300), allowNull: true },
        netVarianceG2: { type: DataTypes.DOUBLE, allowNull: true },
        decidedBy: { type: DataTypes.INTEGER, allowNull: true },
        decidedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: { type: DataTypes.DATE, allowNull: false },
        updatedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, modelName: 'PieceWeightSample', tableName: 'piece_weight_samples' },
    );
  }
}
