import { DataTypes, type QueryInterface } from 'sequelize';

// The ENUM values and column types as this migration shipped: never edit them, add a migration.
const ACCURACY_CLASSES = ['I', 'II', 'III', 'IIII'];
const CONTAINER_KINDS = ['bag', 'tray', 'tote', 'bin', 'other'];
const COUNT_PURPOSES = ['kit_line', 'bin', 'audit', 'part'];
const COUNTING_METHODS = ['scale', 'hand'];
const grams = () => DataTypes.DECIMAL(14, 6);
const pieceWeight = () => DataTypes.DECIMAL(16, 9);
const ratio = () => DataTypes.DECIMAL(10, 8);
const SCALE_STATUSES = ['in_service', 'due', 'locked'];

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const version = { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 };
const ref = (model: string, allowNull = false) => ({ type: DataTypes.INTEGER, allowNull, references: { model, key: 'id' } });

export async function up({ context: q }: { context: QueryInterface }): Promise<void> {
  await q.createTable('scales', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    name: { type: DataTypes.STRING(80), allowNull: false, unique: true },
    location: { type: DataTypes.STRING(120), allowNull: true },
    capacity_g: { type: grams(), allowNull: false },
    min_load_g: { type: grams(), allowNull: false },
    division_g: { type: grams(), allowNull: false },
    verification_interval_g: { type: grams(), allowNull: false },
    accuracy_class: { type: DataTypes.ENUM(...ACCURACY_CLASSES), allowNull: false },
    repeatability_g: { type: grams(), allowNull: true },
    connection: { type: DataTypes.JSON, allowNull: false },
    status: { type: DataTypes.ENUM(...SCALE_STATUSES), allowNull: false, defaultValue: 'in_service' },
    status_reason: { type: DataTypes.STRING(300), allowNull: true },
    calibration_due_at: { type: DataTypes.DATEONLY, allowNull: true },
    version,
    ...timestamps,
  });
  await q.createTable('containers', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    name: { type: DataTypes.STRING(80), allowNull: false, unique: true },
    kind: { type: DataTypes.ENUM(...CONTAINER_KINDS), allowNull: false },
    tare_g: { type: grams(), allowNull: false },
    version,
    ...timestamps,
  });
  await q.createTable('parts', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    part_number: { type: DataTypes.STRING(40), allowNull: false, unique: true },
    description: { type: DataTypes.STRING(200), allowNull: false },
    counting_method: { type: DataTypes.ENUM(...COUNTING_METHODS), allowNull: false, defaultValue: 'scale' },
    apw_g: { type: pieceWeight(), allowNull: true },
    apw_sample_size: { type: DataTypes.INTEGER, allowNull: true },
    piece_spread: { type: ratio(), allowNull: true },
    spread_observations: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    photo_file: { type: DataTypes.STRING(80), allowNull: true },
    version,
    ...timestamps,
  });
  await q.createTable('piece_weight_samples', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    part_id: ref('parts'),
    scale_id: ref('scales'),
    quantity: { type: DataTypes.INTEGER, allowNull: false },
    net_weight_g: { type: grams(), allowNull: false },
    apw_g: { type: pieceWeight(), allowNull: false },
    increments_g: { type: DataTypes.JSON, allowNull: true },
    created_by: ref('users'),
    ...timestamps,
  });
  await q.addIndex('piece_weight_samples', ['part_id', 'created_at']);
  await q.createTable('count_events', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    idempotency_key: { type: DataTypes.STRING(100), allowNull: false, unique: true },
    request_hash: { type: DataTypes.CHAR(64), allowNull: false },
    purpose: { type: DataTypes.ENUM(...COUNT_PURPOSES), allowNull: false },
    part_id: ref('parts'),
    scale_id: ref('scales'),
    container_id: ref('containers', true),
    gross_g: { type: grams(), allowNull: false },
    tare_g: { type: grams(), allowNull: false },
    net_g: { type: grams(), allowNull: false },
    sample_quantity: { type: DataTypes.INTEGER, allowNull: false },
    sample_net_g: { type: grams(), allowNull: false },
    sample_on_pan: { type: DataTypes.BOOLEAN, allowNull: false },
    apw_g: { type: pieceWeight(), allowNull: false },
    piece_spread: { type: ratio(), allowNull: false },
    count_raw: { type: DataTypes.DECIMAL(14, 4), allowNull: false },
    count: { type: DataTypes.INTEGER, allowNull: false },
    standard_uncertainty: { type: DataTypes.DECIMAL(14, 4), allowNull: false },
    expanded_uncertainty: { type: DataTypes.DECIMAL(14, 4), allowNull: false },
    exact: { type: DataTypes.BOOLEAN, allowNull: false },
    target_quantity: { type: DataTypes.INTEGER, allowNull: true },
    warnings: { type: DataTypes.JSON, allowNull: false },
    operator_id: ref('users'),
    // Millisecond timestamps: a replayed capture must answer with exactly the first response.
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await q.addIndex('count_events', ['part_id', 'created_at']);
  await q.addIndex('count_events', ['scale_id', 'created_at']);
  await q.addIndex('count_events', ['operator_id', 'created_at']);
  await q.addIndex('count_events', ['purpose', 'created_at']);
}

export async function down({ context: q }: { context: QueryInterface }): Promise<void> {
  for (const t of ['count_events', 'piece_weight_samples', 'parts', 'containers', 'scales']) await q.dropTable(t);
}
