import { DataTypes, type QueryInterface } from 'sequelize';

// The ENUM values and column types as this migration shipped: never edit them, add a migration.
const AUDIT_STATUSES = ['open', 'closed'];
const AUDIT_VERDICTS = ['accepted', 'rejected'];
const grams = () => DataTypes.DECIMAL(14, 6);
const INSPECTION_LEVELS = ['I', 'II', 'III'];
const VERIFICATION_STAGES = ['initial', 'in_service'];
const WEIGHT_CLASSES = ['E2', 'F1', 'F2', 'M1', 'M2', 'M3'];

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const ref = (model: string, allowNull = false) => ({ type: DataTypes.INTEGER, allowNull, references: { model, key: 'id' } });

export async function up({ context: q }: { context: QueryInterface }): Promise<void> {
  await q.createTable('test_weights', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    identifier: { type: DataTypes.STRING(40), allowNull: false, unique: true },
    nominal_g: { type: grams(), allowNull: false },
    weight_class: { type: DataTypes.ENUM(...WEIGHT_CLASSES), allowNull: false },
    certificate_number: { type: DataTypes.STRING(60), allowNull: true },
    certificate_file: { type: DataTypes.STRING(80), allowNull: true },
    due_at: { type: DataTypes.DATEONLY, allowNull: true },
    active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    ...timestamps,
  });
  await q.createTable('calibration_records', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    scale_id: ref('scales'),
    stage: { type: DataTypes.ENUM(...VERIFICATION_STAGES), allowNull: false },
    performed_at: { type: DataTypes.DATEONLY, allowNull: false },
    performed_by: ref('users'),
    // The submitted test (grams) and the verdict, kept whole so a record can be re-read years later.
    test: { type: DataTypes.JSON, allowNull: false },
    verdict: { type: DataTypes.JSON, allowNull: false },
    test_weight_ids: { type: DataTypes.JSON, allowNull: false },
    weights_adequate: { type: DataTypes.BOOLEAN, allowNull: false },
    pass: { type: DataTypes.BOOLEAN, allowNull: false },
    next_due_at: { type: DataTypes.DATEONLY, allowNull: true },
    notes: { type: DataTypes.STRING(1000), allowNull: true },
    ...timestamps,
  });
  await q.addIndex('calibration_records', ['scale_id', 'performed_at']);
  // One row per unit of scheduled work; inserting it is how one instance claims the work.
  await q.createTable('job_runs', {
    job: { type: DataTypes.STRING(60), primaryKey: true },
    run_key: { type: DataTypes.STRING(120), primaryKey: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.createTable('audits', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    population: { type: DataTypes.JSON, allowNull: false },
    lot_size: { type: DataTypes.INTEGER, allowNull: false },
    level: { type: DataTypes.ENUM(...INSPECTION_LEVELS), allowNull: false },
    aql: { type: DataTypes.DECIMAL(6, 3), allowNull: false },
    code_letter: { type: DataTypes.CHAR(1), allowNull: false },
    sample_size: { type: DataTypes.INTEGER, allowNull: false },
    accept: { type: DataTypes.INTEGER, allowNull: false },
    reject: { type: DataTypes.INTEGER, allowNull: false },
    seed: { type: DataTypes.BIGINT, allowNull: false },
    status: { type: DataTypes.ENUM(...AUDIT_STATUSES), allowNull: false, defaultValue: 'open' },
    defects: { type: DataTypes.INTEGER, allowNull: true },
    verdict: { type: DataTypes.ENUM(...AUDIT_VERDICTS), allowNull: true },
    created_by: ref('users'),
    closed_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await q.createTable('audit_items', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    audit_id: { ...ref('audits'), onDelete: 'CASCADE' },
    count_event_id: ref('count_events'),
    hand_count: { type: DataTypes.INTEGER, allowNull: true },
    counted_by: ref('users', true),
    counted_at: { type: DataTypes.DATE, allowNull: true },
  });
  await q.addIndex('audit_items', ['audit_id', 'count_event_id'], { unique: true });
}

export async function down({ context: q }: { context: QueryInterface }): Promise<void> {
  for (const t of ['audit_items', 'audits', 'job_runs', 'calibration_records', 'test_weights']) await q.dropTable(t);
}
