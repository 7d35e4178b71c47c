import { DataTypes, type QueryInterface } from 'sequelize';

// A print job that went, but whose labels lack something (a character the label fonts cannot print,
// set as "?"), says so in the print log.
export async function up({ context: q }: { context: QueryInterface }): Promise<void> {
  await q.addColumn('print_jobs', 'note', { type: DataTypes.STRING(500), allowNull: true });
}

export async function down({ context: q }: { context: QueryInterface }): Promise<void> {
  await q.removeColumn('print_jobs', 'note');
}
