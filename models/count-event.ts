import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { grams, pieceWeight, ratio } from './columns';
import { COUNT_PURPOSES, type CountPurpose } from '../lib/domain/counting';

// Append-only record of one capture: the submitted weights and the server's own recomputation.
export class CountEvent extends Model<InferAttributes<CountEvent>, InferCreationAttributes<CountEvent>> {
  declare id: CreationOptional<number>;
  declare idempotencyKey: string;
  declare requestHash: string;
  declare purpose: CountPurpose;
  declare partId: number;
  declare scaleId: number;
  /** The scale the load was weighed on, when not the sample's. */
  declare bulkScaleId: CreationOptional<number | null>;
  declare containerId: number | null;
  declare grossG: string;
  declare tareG: string;
  declare netG: string;
  declare sampleQuantity: number;
  declare sampleNetG: string;
  declare sampleOnPan: boolean;
  declare apwG: string;
  declare pieceSpread: string;
  declare countRaw: string;
  declare count: number;
  declare standardUncertainty: string;
  declare expandedUncertainty: string;
  declare exact: boolean;
  declare probabilityExact: CreationOptional<string | null>;
  declare wholePieceRange: CreationOptional<number | null>;
  /** M, and u_r(APW)²: what a kit line needs to count a shared APW once. */
  declare uncertainPieces: CreationOptional<string | null>;
  declare apwRelativeVariance: CreationOptional<number | null>;
  declare targetQuantity: number | null;
  declare warnings: Array<{ code: string; message: string }>;
  declare operatorId: number;
  declare orderLineId: CreationOptional<number | null>;
  declare binId: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    const dec = () => DataTypes.DECIMAL(14, 4);
    CountEvent.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        idempotencyKey: { type: DataTypes.STRING(100), allowNull: false, unique: true },
        requestHash: { type: DataTypes.CHAR(64), allowNull: false },
        purpose: { type: DataTypes.ENUM(...COUNT_PURPOSES), allowNull: false },
        partId: { type: DataTypes.INTEGER, allowNull: false },
        scaleId: { type: DataTypes.INTEGER, allowNull: false },
        bulkScaleId: { type: DataTypes.INTEGER, allowNull: true },
        containerId: { type: DataTypes.INTEGER, allowNull: true },
        grossG: { type: grams(), allowNull: false },
        tareG: { type: grams(), allowNull: false },
        netG: { type: grams(), allowNull: false },
        sampleQuantity: { type: DataTypes.INTEGER, allowNull: false },
        sampleNetG: { type: grams(), allowNull: false },
        sampleOnPan: { type: DataTypes.BOOLEAN, allowNull: false },
        apwG: { type: pieceWeight(), allowNull: false },
        pieceSpread: { type: ratio(), allowNull: false },
        countRaw: { type: dec(), allowNull: false },
        count: { type: DataTypes.INTEGER, allowNull: false },
        standardUncertainty: { type: dec(), allowNull: false },
        expandedUncertainty: { type: dec(), allowNull: false },
        exact: { type: DataTypes.BOOLEAN, allowNull: false },
        probabilityExact: { type: DataTypes.DECIMAL(8, 6), allowNull: true },
        wholePieceRange: { type: DataTypes.INTEGER, allowNull: true },
        uncertainPieces: { type: dec(), allowNull: true },
        apwRelativeVariance: { type: DataTypes.DOUBLE, allowNull: true },
        targetQuantity: { type: DataTypes.INTEGER, allowNull: true },
        warnings: { type: DataTypes.JSON, allowNull: false },
        operatorId: { type: DataTypes.INTEGER, allowNull: false },
        orderLineId: { type: DataTypes.INTEGER, allowNull: true },
        binId: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: { type: DataTypes.DATE(3), allowNull: false },
        updatedAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, modelName: 'CountEvent', tableName: 'count_events' },
    );
  }
}
