import { DataTypes, type QueryInterface } from 'sequelize';

// Sessions the server can end: sign-out, password change, switch-off and role change end them at
// once, and each has an absolute lifetime (site setting, default one 12-hour shift) besides the
// idle limit. And four eyes on stock: whoever counted a variance does not decide it (site setting,
// on by default). Values are frozen here.
const END_REASONS = ['signed_out', 'signed_out_everywhere', 'ended_by_admin', 'password_changed', 'switched_off', 'role_changed'];

export async function up({ context: q }: { context: QueryInterface }): Promise<void> {
  await q.createTable('user_sessions', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' } },
    last_seen_at: { type: DataTypes.DATE, allowNull: false },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    ended_at: { type: DataTypes.DATE, allowNull: true },
    end_reason: { type: DataTypes.ENUM(...END_REASONS), allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.addIndex('user_sessions', ['user_id', 'ended_at']);
  await q.addIndex('user_sessions', ['expires_at']);
  await q.addColumn('site_settings', 'session_hours', { type: DataTypes.INTEGER, allowNull: false, defaultValue: 12 });
  await q.addColumn('site_settings', 'four_eyes_variances', { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true });
}

export async function down({ context: q }: { context: QueryInterface }): Promise<void> {
  await q.removeColumn('site_settings', 'four_eyes_variances');
  await q.removeColumn('site_settings', 'session_hours');
  await q.dropTable('user_sessions');
}
