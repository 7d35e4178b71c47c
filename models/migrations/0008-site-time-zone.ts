import { DataTypes, type QueryInterface } from 'sequelize';

// The site's IANA time zone; null follows the server's own zone.
export async function up({ context: q }: { context: QueryInterface }): Promise<void> {
  await q.addColumn('site_settings', 'time_zone', { type: DataTypes.STRING(64), allowNull: true });
}

export async function down({ context: q }: { context: QueryInterface }): Promise<void> {
  await q.removeColumn('site_settings', 'time_zone');
}
