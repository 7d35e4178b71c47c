import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { Part } from '../../models';
import { testDb, unique } from '../helpers/db';
import { signedIn } from '../helpers/http';

describe('parts CSV export', () => {
  it('answers text/csv as a download, filtered by q, with formula-looking cells made plain text', async () => {
    const { agent } = await signedIn('operator');
    const tag = unique('EXP').toUpperCase();
    testDb();
    await Part.create({
      partNumber: `${tag}-1`,
      description: '=HYPERLINK("http://example.test","click")',
      countingMethod: 'scale',
      apwG: '0.250000000',
      apwSampleSize: 20,
      pieceSpread: null,
      photoFile: null,
    });
    await Part.create({
      partNumber: `${tag}-2`,
      description: '@SUM(A1:A9)',
      countingMethod: 'hand',
      apwG: null,
      apwSampleSize: null,
      pieceSpread: null,
      photoFile: null,
    });
    const res = await agent
      .get(`/api/v1/parts/export?q=${tag}`)
      .buffer(true)
      .parse((r, done) => {
        let text = '';
        r.on('data', (d: Buffer) => (text += d));
        r.on('end', () => done(null, text));
      });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="parts-\d{4}-\d{2}-\d{2}\.csv"$/);
    const rows = parse(res.body as string) as string[][];
    expect(rows[0]).toEqual(['part_number', 'description', 'counting_method', 'apw_g', 'apw_sample_size', 'piece_spread', 'spread_learned']);
    expect(rows.slice(1)).toEqual([
      [`${tag}-1`, `'=HYPERLINK("http://example.test","click")`, 'scale', '0.25', '20', '', 'no'],
      [`${tag}-2`, "'@SUM(A1:A9)", 'hand', '', '', '', 'no'],
    ]);
  });

  it('refuses a bad sort with 400', async () => {
    const { agent } = await signedIn('operator');
    const res = await agent.get('/api/v1/parts/export?sort=price');
    expect(res.status).toBe(400);
    expect(res.body.error.fields.sort).toBeTruthy();
  });
});
