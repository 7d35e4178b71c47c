import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

// One line of a kit's bill of material: a part, how many per kit, and the allowed window −below/+above.
export class KitComponent extends Model<InferAttributes<KitComponent>, InferCreationAttributes<KitComponent>> {
  declare id: CreationOptional<number>;
  declare kitId: number;
  declare partId: number;
  declare quantity: number;
  declare toleranceBelow: number;
  declare toleranceAbove: number;

  static initModel(sequelize: Sequelize): void {
    KitComponent.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        kitId: { type: DataTypes.INTEGER, allowNull: false },
        partId: { type: DataTypes.INTEGER, allowNull: false },
        quantity: { type: DataTypes.INTEGER, allowNull: false },
        toleranceBelow: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        toleranceAbove: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      },
      { sequelize, modelName: 'KitComponent', tableName: 'kit_components', timestamps: false },
    );
  }
}
