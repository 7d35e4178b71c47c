import { DataTypes, type QueryInterface } from 'sequelize';

// The ENUM values and column types as this migration shipped: never edit them, add a migration.
const PRINT_JOB_STATUSES = ['queued', 'sent', 'failed'];

// The print log: every label job the server sent (or failed to send) to a printer.
export async function up({ context: q }: { context: QueryInterface }): Promise<void> {
  await q.createTable('print_jobs', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    // One request for many labels becomes a batch of jobs of at most 100 labels each.
    batch_id: { type: DataTypes.STRING(36), allowNull: false },
    batch_index: { type: DataTypes.INTEGER, allowNull: false },
    batch_count: { type: DataTypes.INTEGER, allowNull: false },
    template: { type: DataTypes.STRING(10), allowNull: false },
    stock: { type: DataTypes.STRING(20), allowNull: false },
    item_ids: { type: DataTypes.TEXT, allowNull: false },
    labels: { type: DataTypes.INTEGER, allowNull: false },
    printer_url: { type: DataTypes.STRING(300), allowNull: false },
    status: { type: DataTypes.ENUM(...PRINT_JOB_STATUSES), allowNull: false },
    pages: { type: DataTypes.INTEGER, allowNull: true },
    bytes: { type: DataTypes.INTEGER, allowNull: true },
    printer_job_id: { type: DataTypes.INTEGER, allowNull: true },
    error: { type: DataTypes.STRING(500), allowNull: true },
    requested_by: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' } },
    sent_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.addIndex('print_jobs', ['batch_id', 'batch_index']);
  await q.addIndex('print_jobs', ['created_at']);
}

export async function down({ context: q }: { context: QueryInterface }): Promise<void> {
  await q.dropTable('print_jobs');
}
