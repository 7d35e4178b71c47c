import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class Kit extends Model<InferAttributes<Kit>, InferCreationAttributes<Kit>> {
  declare id: CreationOptional<number>;
  declare code: string;
  declare revision: string;
  declare description: string;
  declare active: CreationOptional<boolean>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Kit.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        code: { type: DataTypes.STRING(40), allowNull: false },
        revision: { type: DataTypes.STRING(8), allowNull: false },
        description: { type: DataTypes.STRING(200), allowNull: false },
        active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: { type: DataTypes.DATE, allowNull: false },
        updatedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, modelName: 'Kit', tableName: 'kits', version: true, indexes: [{ unique: true, fields: ['code', 'revision'] }] },
    );
  }
}
