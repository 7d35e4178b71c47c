import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { grams } from './columns';
import { CONTAINER_KINDS, type ContainerKind } from '../lib/domain/stock';

// Bags, trays, totes and bins with a known empty weight (preset tare).
export class Container extends Model<InferAttributes<Container>, InferCreationAttributes<Container>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare kind: ContainerKind;
  declare tareG: string;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Container.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        name: { type: DataTypes.STRING(80), allowNull: false, unique: true },
        kind: { type: DataTypes.ENUM(...CONTAINER_KINDS), allowNull: false },
        tareG: { type: grams(), allowNull: false },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: { type: DataTypes.DATE, allowNull: false },
        updatedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, modelName: 'Container', tableName: 'containers', version: true },
    );
  }
}
