import { DataTypes, type QueryInterface } from 'sequelize';

// The ENUM values and column types as this migration shipped: never edit them, add a migration.
const BIN_COUNT_STATUSES = ['applied', 'pending', 'approved', 'rejected'];

export async function up({ context: q }: { context: QueryInterface }): Promise<void> {
  await q.createTable('bin_counts', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    bin_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'bins', key: 'id' } },
    count_event_id: { type: DataTypes.INTEGER, allowNull: false, unique: true, references: { model: 'count_events', key: 'id' } },
    book_quantity: { type: DataTypes.INTEGER, allowNull: false },
    counted: { type: DataTypes.INTEGER, allowNull: false },
    variance: { type: DataTypes.INTEGER, allowNull: false },
    status: { type: DataTypes.ENUM(...BIN_COUNT_STATUSES), allowNull: false },
    decided_by: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' } },
    decided_at: { type: DataTypes.DATE, allowNull: true },
    note: { type: DataTypes.STRING(300), allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.addIndex('bin_counts', ['bin_id', 'created_at']);
  await q.addIndex('bin_counts', ['status']);
}

export async function down({ context: q }: { context: QueryInterface }): Promise<void> {
  await q.dropTable('bin_counts');
}
