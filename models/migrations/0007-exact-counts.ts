import { DataTypes, type QueryInterface } from 'sequelize';

// Exact means exact: a part keeps its spread with its degrees of freedom; samples can be held for
// review; a capture keeps how sure it was; a kit line keeps its ± whole pieces. Values are frozen here.
export async function up({ context: q }: { context: QueryInterface }): Promise<void> {
  // The learned spread as observed: relative scatter s²/μ², the noise in it, and ν.
  await q.addColumn('parts', 'spread_scatter', { type: DataTypes.DOUBLE, allowNull: true });
  await q.addColumn('parts', 'spread_noise', { type: DataTypes.DOUBLE, allowNull: true });
  await q.addColumn('parts', 'spread_dof', { type: DataTypes.INTEGER, allowNull: true });

  await q.addColumn('piece_weight_samples', 'status', { type: DataTypes.ENUM('accepted', 'held', 'rejected'), allowNull: false, defaultValue: 'accepted' });
  await q.addColumn('piece_weight_samples', 'hold_reason', { type: DataTypes.STRING(300), allowNull: true });
  await q.addColumn('piece_weight_samples', 'net_variance_g2', { type: DataTypes.DOUBLE, allowNull: true });
  await q.addColumn('piece_weight_samples', 'decided_by', { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' } });
  await q.addColumn('piece_weight_samples', 'decided_at', { type: DataTypes.DATE, allowNull: true });
  await q.addIndex('piece_weight_samples', ['status']);

  await q.addColumn('count_events', 'bulk_scale_id', { type: DataTypes.INTEGER, allowNull: true, references: { model: 'scales', key: 'id' } });
  await q.addColumn('count_events', 'probability_exact', { type: DataTypes.DECIMAL(8, 6), allowNull: true });
  await q.addColumn('count_events', 'whole_piece_range', { type: DataTypes.INTEGER, allowNull: true });
  await q.addColumn('count_events', 'uncertain_pieces', { type: DataTypes.DECIMAL(14, 4), allowNull: true });
  await q.addColumn('count_events', 'apw_relative_variance', { type: DataTypes.DOUBLE, allowNull: true });

  await q.addColumn('build_order_lines', 'whole_piece_range', { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 });
  // A line sent back for a recount counts only the captures made after this one.
  await q.addColumn('build_order_lines', 'recount_after_event_id', { type: DataTypes.INTEGER, allowNull: true });

  // Cycle counts blind by default: the counter does not see the book quantity until the count is in.
  await q.addColumn('site_settings', 'blind_cycle_counts', { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true });

  // 2 % was the old value for an unknown spread; it let loose parts (5 %) read exact when they
  // were not. A site still on it moves to the cautious 5 %; a site that chose its own keeps it.
  await q.sequelize.query('UPDATE site_settings SET default_piece_spread = 0.05 WHERE default_piece_spread = 0.02');
}

export async function down({ context: q }: { context: QueryInterface }): Promise<void> {
  await q.removeColumn('site_settings', 'blind_cycle_counts');
  await q.removeColumn('build_order_lines', 'recount_after_event_id');
  await q.removeColumn('build_order_lines', 'whole_piece_range');
  for (const c of ['apw_relative_variance', 'uncertain_pieces', 'whole_piece_range', 'probability_exact', 'bulk_scale_id'])
    await q.removeColumn('count_events', c);
  await q.removeIndex('piece_weight_samples', ['status']);
  for (const c of ['decided_at', 'decided_by', 'net_variance_g2', 'hold_reason', 'status']) await q.removeColumn('piece_weight_samples', c);
  for (const c of ['spread_dof', 'spread_noise', 'spread_scatter']) await q.removeColumn('parts', c);
}
