import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class AuditItem extends Model<InferAttributes<AuditItem>, InferCreationAttributes<AuditItem>> {
  declare id: CreationOptional<number>;
  declare auditId: number;
  declare countEventId: number;
  declare handCount: number | null;
  declare countedBy: number | null;
  declare countedAt: Date | null;

  static initModel(sequelize: Sequelize): void {
    AuditItem.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        auditId: { type: DataTypes.INTEGER, allowNull: false },
        countEventId: { type: DataTypes.INTEGER, allowNull: false },
        handCount: { type: DataTypes.INTEGER, allowNull: true },
        countedBy: { type: DataTypes.INTEGER, allowNull: true },
        countedAt: { type: DataTypes.DATE, allowNull: true },
      },
      { sequelize, modelName: 'AuditItem', tableName: 'audit_items', timestamps: false },
    );
  }
}
