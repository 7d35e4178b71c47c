import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { grams, pieceWeight } from './columns';

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
        createdAt: { type: DataTypes.DATE, allowNull: false },
        updatedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, modelName: 'PieceWeightSample', tableName: 'piece_weight_samples' },
    );
  }
}
