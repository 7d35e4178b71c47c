import { describe, expect, it } from 'vitest';
import { Part } from '../../models';
import { createPart, testDb, unique } from '../helpers/db';
import { anonymous, signedIn } from '../helpers/http';

// What every JSON route expects of a request before its own schema runs: an address that exists,
// a body declared as JSON, ids in one spelling.
describe('request shape', () => {
  it('answers an /api address no route serves with the JSON error shape, for every method', async () => {
    const { agent } = await signedIn('operator');
    for (const method of ['get', 'post', 'put', 'patch', 'delete'] as const) {
      const res = await agent[method]('/api/v1/no-such-thing/42');
      expect(res.status).toBe(404);
      expect(res.headers['content-type']).toMatch(/^application\/json/);
      expect(res.body.error.code).toBe('not_found');
    }
    expect((await anonymous().get('/api/v2/parts')).body.error.code).toBe('not_found');
    // A route that exists keeps answering itself: the catch-all only takes what is left.
    expect((await agent.get('/api/v1/health')).status).toBe(200);
  });

  it('refuses a JSON body sent under another content type with 415, and writes nothing', async () => {
    const { agent } = await signedIn('planner');
    const partNumber = unique('CT').toUpperCase();
    const json = JSON.stringify({ partNumber, description: 'Spring washer M4' });
    for (const type of ['text/plain', 'application/x-www-form-urlencoded', 'application/json; charset=utf-16', 'application/xml']) {
      const res = await agent.post('/api/v1/parts').set('Content-Type', type).send(json);
      expect(res.status, type).toBe(415);
      expect(res.body.error.code).toBe('unsupported_media_type');
    }
    testDb();
    expect(await Part.count({ where: { partNumber } })).toBe(0);
    // The same body declared as JSON, with the charset spelled out or as a +json type, is taken.
    const ok = await agent.post('/api/v1/parts').set('Content-Type', 'application/json; charset=UTF-8').send(json);
    expect(ok.status).toBe(201);
    const other = await agent
      .post('/api/v1/parts')
      .set('Content-Type', 'application/merge-patch+json')
      .send(JSON.stringify({ partNumber: `${partNumber}-2`, description: 'Spring washer M5' }));
    expect(other.status).toBe(201);
  });

  it('takes a record id only as plain decimal digits: hex, exponents, signs and padding are a 400', async () => {
    const { agent } = await signedIn('operator');
    const part = await createPart();
    expect((await agent.get(`/api/v1/parts/${part.id}`)).status).toBe(200);
    for (const spelling of [`0x${part.id.toString(16)}`, `${part.id}e0`, `+${part.id}`, `0${part.id}`, `${part.id}.0`, '%20' + part.id, '0', '2147483648']) {
      const res = await agent.get(`/api/v1/parts/${spelling}`);
      expect(res.status, spelling).toBe(400);
      expect(res.body.error.fields.id).toBe('Not a record id');
    }
    expect((await agent.get(`/api/v1/counts?partId=0x${part.id.toString(16)}`)).status).toBe(400);
    expect((await agent.get(`/api/v1/counts?partId=${part.id}`)).status).toBe(200);
  });
});
