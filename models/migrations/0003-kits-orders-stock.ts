import { DataTypes, type QueryInterface } from 'sequelize';

// The ENUM values and column types as this migration shipped: never edit them, add a migration.
const ABC_CLASSES = ['A', 'B', 'C'];
const LINE_VERDICTS = ['open', 'in', 'uncertain', 'out'];
const MOVEMENT_REASONS = ['initial', 'receipt', 'adjustment', 'consumption'];
const ORDER_STATUSES = ['draft', 'released', 'in_progress', 'complete', 'cancelled'];
const RESERVATION_STATUSES = ['active', 'consumed', 'released'];

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const version = { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 };
const ref = (model: string, allowNull = false) => ({ type: DataTypes.INTEGER, allowNull, references: { model, key: 'id' } });

export async function up({ context: q }: { context: QueryInterface }): Promise<void> {
  await q.createTable('bins', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    code: { type: DataTypes.STRING(20), allowNull: false, unique: true },
    part_id: ref('parts'),
    container_id: ref('containers', true),
    book_quantity: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    abc_class: { type: DataTypes.ENUM(...ABC_CLASSES), allowNull: false, defaultValue: 'C' },
    last_counted_at: { type: DataTypes.DATE, allowNull: true },
    version,
    ...timestamps,
  });
  await q.addIndex('bins', ['part_id']);
  // One row per part: the lock that serialises reservations, and the on-hand total of its bins.
  await q.createTable('part_stock', {
    part_id: { type: DataTypes.INTEGER, primaryKey: true, references: { model: 'parts', key: 'id' } },
    on_hand: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    reserved: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
  });
  await q.createTable('stock_movements', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    part_id: ref('parts'),
    bin_id: ref('bins', true),
    delta: { type: DataTypes.INTEGER, allowNull: false },
    reason: { type: DataTypes.ENUM(...MOVEMENT_REASONS), allowNull: false },
    ref_type: { type: DataTypes.STRING(30), allowNull: true },
    ref_id: { type: DataTypes.INTEGER, allowNull: true },
    note: { type: DataTypes.STRING(300), allowNull: true },
    created_by: ref('users'),
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.addIndex('stock_movements', ['part_id', 'created_at']);
  await q.createTable('kits', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    code: { type: DataTypes.STRING(40), allowNull: false },
    revision: { type: DataTypes.STRING(8), allowNull: false },
    description: { type: DataTypes.STRING(200), allowNull: false },
    active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    version,
    ...timestamps,
  });
  await q.addIndex('kits', ['code', 'revision'], { unique: true });
  await q.createTable('kit_components', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    kit_id: { ...ref('kits'), onDelete: 'CASCADE' },
    part_id: ref('parts'),
    quantity: { type: DataTypes.INTEGER, allowNull: false },
    tolerance_below: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    tolerance_above: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
  });
  await q.addIndex('kit_components', ['kit_id', 'part_id'], { unique: true });
  await q.createTable('build_orders', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    number: { type: DataTypes.STRING(20), allowNull: false, unique: true },
    kit_id: ref('kits'),
    quantity: { type: DataTypes.INTEGER, allowNull: false },
    due_date: { type: DataTypes.DATEONLY, allowNull: true },
    status: { type: DataTypes.ENUM(...ORDER_STATUSES), allowNull: false, defaultValue: 'draft' },
    created_by: ref('users'),
    released_at: { type: DataTypes.DATE, allowNull: true },
    completed_at: { type: DataTypes.DATE, allowNull: true },
    cancelled_at: { type: DataTypes.DATE, allowNull: true },
    override_reason: { type: DataTypes.STRING(500), allowNull: true },
    version,
    ...timestamps,
  });
  await q.addIndex('build_orders', ['status']);
  await q.createTable('build_order_lines', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    order_id: { ...ref('build_orders'), onDelete: 'CASCADE' },
    part_id: ref('parts'),
    quantity_per_kit: { type: DataTypes.INTEGER, allowNull: false },
    required: { type: DataTypes.INTEGER, allowNull: false },
    tolerance_below: { type: DataTypes.INTEGER, allowNull: false },
    tolerance_above: { type: DataTypes.INTEGER, allowNull: false },
    counted: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    // Σ u² of the captures on this line (pieces²): independent captures add in quadrature.
    variance_sum: { type: DataTypes.DECIMAL(16, 6), allowNull: false, defaultValue: 0 },
    captures: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    verdict: { type: DataTypes.ENUM(...LINE_VERDICTS), allowNull: false, defaultValue: 'open' },
    ...timestamps,
  });
  await q.addIndex('build_order_lines', ['order_id', 'part_id'], { unique: true });
  await q.addIndex('build_order_lines', ['part_id']);
  await q.createTable('stock_reservations', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    order_line_id: { ...ref('build_order_lines'), unique: true, onDelete: 'CASCADE' },
    part_id: ref('parts'),
    quantity: { type: DataTypes.INTEGER, allowNull: false },
    status: { type: DataTypes.ENUM(...RESERVATION_STATUSES), allowNull: false, defaultValue: 'active' },
    ...timestamps,
  });
  await q.addIndex('stock_reservations', ['part_id', 'status']);
  await q.addColumn('count_events', 'order_line_id', ref('build_order_lines', true));
  await q.addColumn('count_events', 'bin_id', ref('bins', true));
}

export async function down({ context: q }: { context: QueryInterface }): Promise<void> {
  await q.removeColumn('count_events', 'bin_id');
  await q.removeColumn('count_events', 'order_line_id');
  for (const t of ['stock_reservations', 'build_order_lines', 'build_orders', 'kit_components', 'kits', 'stock_movements', 'part_stock', 'bins']) {
    await q.dropTable(t);
  }
}
