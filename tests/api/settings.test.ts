import { describe, expect, it } from 'vitest';
import { signedIn } from '../helpers/http';

describe('site settings', () => {
  it('lets an admin change defaults with the loaded version, and refuses a stale one', async () => {
    const { agent } = await signedIn('admin');
    const { settings } = (await agent.get('/api/v1/settings')).body;
    const res = await agent.patch('/api/v1/settings').send({ defaultPieceSpread: 0.03, version: settings.version });
    expect(res.status).toBe(200);
    expect(res.body.settings.defaultPieceSpread).toBe(0.03);
    expect(res.body.settings.version).toBe(settings.version + 1);
    const stale = await agent.patch('/api/v1/settings').send({ defaultPieceSpread: 0.04, version: settings.version });
    expect(stale.status).toBe(409);
    await agent.patch('/api/v1/settings').send({ defaultPieceSpread: settings.defaultPieceSpread, version: settings.version + 1 });
  });

  it('counts bins blind by default and unknown spreads at a cautious 5 %, and lets an admin switch blind counts off', async () => {
    const { agent } = await signedIn('admin');
    const { settings } = (await agent.get('/api/v1/settings')).body;
    expect(settings).toMatchObject({ blindCycleCounts: true, defaultPieceSpread: 0.05 });
    const off = await agent.patch('/api/v1/settings').send({ blindCycleCounts: false, version: settings.version });
    expect(off.body.settings.blindCycleCounts).toBe(false);
    const bad = await agent.patch('/api/v1/settings').send({ blindCycleCounts: 'yes', version: off.body.settings.version });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.blindCycleCounts).toBeTruthy();
    await agent.patch('/api/v1/settings').send({ blindCycleCounts: true, version: off.body.settings.version });
  });

  it('rejects out-of-range values with field messages', async () => {
    const { agent } = await signedIn('admin');
    const res = await agent.patch('/api/v1/settings').send({ defaultPieceSpread: -1, stabilityWindowMs: 5, displayUnit: 'stone', version: 0 });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['defaultPieceSpread', 'displayUnit', 'stabilityWindowMs']);
  });
});
