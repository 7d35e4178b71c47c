import { DataTypes, type QueryInterface } from 'sequelize';

// Idempotency keys for creates (orders, kits, bins): a request sent twice with the same key makes one
// record, and the second answer names the first record.
export async function up({ context: q }: { context: QueryInterface }): Promise<void> {
  await q.createTable('request_keys', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' } },
    scope: { type: DataTypes.STRING(40), allowNull: false },
    idem_key: { type: DataTypes.STRING(100), allowNull: false },
    fingerprint: { type: DataTypes.CHAR(64), allowNull: false },
    record_id: { type: DataTypes.INTEGER, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.addIndex('request_keys', ['user_id', 'scope', 'idem_key'], { unique: true, name: 'request_keys_once' });
  await q.addIndex('request_keys', ['created_at']);
}

export async function down({ context: q }: { context: QueryInterface }): Promise<void> {
  await q.dropTable('request_keys');
}
