import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { PRINT_JOB_STATUSES, type PrintJobStatus } from '../lib/domain/labels';

// The print log: what the server sent to a label printer, and how it went.
export class PrintJob extends Model<InferAttributes<PrintJob>, InferCreationAttributes<PrintJob>> {
  declare id: CreationOptional<number>;
  declare batchId: string;
  declare batchIndex: number;
  declare batchCount: number;
  declare template: string;
  declare stock: string;
  declare itemIds: string; // JSON list of the record ids, one label each
  declare labels: number;
  declare printerUrl: string;
  declare status: PrintJobStatus;
  declare pages: number | null;
  declare bytes: number | null;
  declare printerJobId: number | null;
  declare error: string | null;
  declare note: string | null;
  declare requestedBy: number | null; // null when the server printed on its own (a completed order)
  declare sentAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    PrintJob.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        batchId: { type: DataTypes.STRING(36), allowNull: false },
        batchIndex: { type: DataTypes.INTEGER, allowNull: false },
        batchCount: { type: DataTypes.INTEGER, allowNull: false },
        template: { type: DataTypes.STRING(10), allowNull: false },
        stock: { type: DataTypes.STRING(20), allowNull: false },
        itemIds: { type: DataTypes.TEXT, allowNull: false },
        labels: { type: DataTypes.INTEGER, allowNull: false },
        printerUrl: { type: DataTypes.STRING(300), allowNull: false },
        status: { type: DataTypes.ENUM(...PRINT_JOB_STATUSES), allowNull: false },
        pages: { type: DataTypes.INTEGER, allowNull: true },
        bytes: { type: DataTypes.INTEGER, allowNull: true },
        printerJobId: { type: DataTypes.INTEGER, allowNull: true },
        error: { type: DataTypes.STRING(500), allowNull: true },
        note: { type: DataTypes.STRING(500), allowNull: true },
        requestedBy: { type: DataTypes.INTEGER, allowNull: true },
        sentAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: { type: DataTypes.DATE, allowNull: false },
        updatedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, modelName: 'PrintJob', tableName: 'print_jobs' },
    );
  }
}
