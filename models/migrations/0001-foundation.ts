import { DataTypes, type QueryInterface } from 'sequelize';

// The roles as this migration shipped: never edit them, add a migration.
const ROLES = ['operator', 'planner', 'clerk', 'quality', 'admin'];

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

export async function up({ context: q }: { context: QueryInterface }): Promise<void> {
  await q.createTable('users', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    role: { type: DataTypes.ENUM(...ROLES), allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: true },
    active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    ...timestamps,
  });
  await q.createTable('site_settings', {
    id: { type: DataTypes.INTEGER, primaryKey: true },
    site_name: { type: DataTypes.STRING(120), allowNull: false },
    display_unit: { type: DataTypes.STRING(4), allowNull: false },
    default_piece_spread: { type: DataTypes.DECIMAL(6, 4), allowNull: false },
    stability_window_ms: { type: DataTypes.INTEGER, allowNull: false },
    variance_threshold_pct: { type: DataTypes.DECIMAL(6, 2), allowNull: false },
    variance_threshold_pcs: { type: DataTypes.INTEGER, allowNull: false },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    ...timestamps,
  });
  // Defaults: piece spread 2 % and a 1 s stability window are common practice, not a standard.
  const now = new Date();
  await q.bulkInsert('site_settings', [
    {
      id: 1,
      site_name: 'Tallyforge',
      display_unit: 'g',
      default_piece_spread: 0.02,
      stability_window_ms: 1000,
      variance_threshold_pct: 2,
      variance_threshold_pcs: 5,
      version: 0,
      created_at: now,
      updated_at: now,
    },
  ]);
  await q.createTable('password_tokens', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await q.createTable('sign_in_throttles', {
    scope_key: { type: DataTypes.STRING(300), primaryKey: true },
    failures: { type: DataTypes.INTEGER, allowNull: false },
    window_start: { type: DataTypes.DATE, allowNull: false },
    blocked_until: { type: DataTypes.DATE, allowNull: true },
  });
  await q.createTable('mail_messages', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    kind: { type: DataTypes.STRING(40), allowNull: false },
    to_address: { type: DataTypes.STRING(1000), allowNull: false },
    subject: { type: DataTypes.STRING(300), allowNull: false },
    body_text: { type: DataTypes.TEXT, allowNull: false },
    status: { type: DataTypes.ENUM('queued', 'sent', 'failed'), allowNull: false },
    error: { type: DataTypes.STRING(500), allowNull: true },
    sent_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await q.addIndex('mail_messages', ['created_at']);
}

export async function down({ context: q }: { context: QueryInterface }): Promise<void> {
  for (const t of ['mail_messages', 'sign_in_throttles', 'password_tokens', 'site_settings', 'users']) await q.dropTable(t);
}
