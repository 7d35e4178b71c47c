import http from 'node:http';
import { describe, expect, it } from 'vitest';
import { createPart, createUser, TEST_PASSWORD } from '../helpers/db';
import { anonymous, baseUrl, signedIn } from '../helpers/http';

// A raw request, so the body can be sent without a declared length (chunked), as an attacker may.
function chunkedPost(
  path: string,
  chunks: number,
  chunkBytes: number,
  { method = 'POST', headers = {} as Record<string, string> } = {},
): Promise<{ status: number; body: string }> {
  return new Promise((resolve, reject) => {
    const req = http.request(
      new URL(path, baseUrl()),
      { method, headers: { 'Content-Type': 'application/json', 'Transfer-Encoding': 'chunked', ...headers } },
      (res) => {
        let body = '';
        res.on('data', (d) => (body += d));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, body }));
      },
    );
    // The server may answer and close before the whole body is out: that is the point.
    req.on('error', (err) =>
      (err as NodeJS.ErrnoException).code === 'EPIPE' || (err as NodeJS.ErrnoException).code === 'ECONNRESET' ? undefined : reject(err),
    );
    const piece = `{"k":"${'x'.repeat(chunkBytes - 8)}"}`;
    let sent = 0;
    const more = () => {
      while (sent < chunks) {
        sent++;
        if (!req.write(piece)) return void req.once('drain', more);
      }
      req.end();
    };
    more();
  });
}

describe('request body limits', () => {
  it('refuses a sign-in body over its small limit with 413 from its declared length, and names the limit', async () => {
    const res = await anonymous()
      .post('/api/v1/session')
      .set('Content-Type', 'application/json')
      .send(JSON.stringify({ email: 'a@example.test', password: 'x'.repeat(20_000) }));
    expect(res.status).toBe(413);
    expect(res.body.error).toMatchObject({ code: 'payload_too_large', message: expect.stringContaining('8 KB') });
    expect(res.headers['cache-control']).toBe('no-store');
  });

  it('stops reading a body sent without a length once it passes the limit', async () => {
    const res = await chunkedPost('/api/v1/session', 200, 1024);
    expect(res.status).toBe(413);
  });

  it('stops reading an upload sent without a length once it passes the upload limit, before parsing it', async () => {
    const user = await createUser('clerk');
    const signIn = await anonymous().post('/api/v1/session').send({ email: user.email, password: TEST_PASSWORD });
    const cookie = ([] as string[])
      .concat(signIn.headers['set-cookie'] ?? [])
      .map((c) => c.split(';')[0])
      .join('; ');
    const part = await createPart();
    const res = await chunkedPost(`/api/v1/parts/${part.id}/photo`, 6 * 1024, 1024, {
      method: 'PUT',
      headers: { Cookie: cookie, 'Content-Type': 'multipart/form-data; boundary=x' },
    });
    expect(res.status).toBe(413);
    expect(JSON.parse(res.body).error.code).toBe('payload_too_large');
  });

  it('gets its 413 to a client that writes the whole oversized body before reading, on a connection that then closes', async () => {
    // supertest asks for Connection: close and reads only once its 6 MB are written.
    const { agent } = await signedIn('planner');
    const res = await agent
      .post('/api/v1/kits')
      .set('Content-Type', 'application/json')
      .send(`${' '.repeat(6_000_000)}{}`);
    expect(res.status).toBe(413);
  });

  it('takes ordinary JSON up to 256 KB elsewhere, and refuses deeper nesting or a flood of keys', async () => {
    const { agent } = await signedIn('planner');
    const big = await agent
      .post('/api/v1/kits')
      .set('Content-Type', 'application/json')
      .send(JSON.stringify({ code: 'X', pad: 'y'.repeat(300 * 1024) }));
    expect(big.status).toBe(413);
    // Under the limit the body is read and judged on what it says.
    const within = await agent
      .post('/api/v1/kits')
      .set('Content-Type', 'application/json')
      .send(JSON.stringify({ code: 'X', description: 'y'.repeat(200 * 1024) }));
    expect(within.status).toBe(400);
    expect(within.body.error.fields).toHaveProperty('description');
    let deep: unknown = 1;
    for (let i = 0; i < 40; i++) deep = { d: deep };
    const nested = await agent.post('/api/v1/kits').send(deep as object);
    expect(nested.status).toBe(400);
    expect(nested.body.error.message).toMatch(/nested more than 20/);
    const keys = Object.fromEntries(Array.from({ length: 21_000 }, (_, i) => [i.toString(36), 1]));
    const flood = await agent.post('/api/v1/kits').send(keys);
    expect(flood.status).toBe(400);
    expect(flood.body.error.message).toMatch(/more than 20000 values/);
  });

  it('refuses text that is not well-formed Unicode instead of storing it as "?", and takes a real pair', async () => {
    const { agent } = await signedIn('planner');
    // Written as JSON escapes: a lone low surrogate, then a proper pair (U+1F529).
    const lone = await agent
      .post('/api/v1/kits')
      .set('Content-Type', 'application/json')
      .send('{"code":"KX","revision":"A","description":"bolt \\udc00 tray","components":[]}');
    expect(lone.status).toBe(400);
    expect(lone.body.error.message).toMatch(/not well-formed Unicode/);
    const key = await agent.post('/api/v1/kits').set('Content-Type', 'application/json').send('{"\\ud83d":1}');
    expect(key.status).toBe(400);
    const pair = await agent.post('/api/v1/kits').set('Content-Type', 'application/json').send('{"code":"KX","description":"bolt \\ud83d\\udd29 tray"}');
    expect(pair.status).toBe(400);
    expect(pair.body.error.message).not.toMatch(/Unicode/);
  });

  it('answers API JSON with Cache-Control: no-store', async () => {
    const { agent } = await signedIn('clerk');
    expect((await agent.get('/api/v1/parts')).headers['cache-control']).toBe('no-store');
    // Routes that build their own Response get it too.
    expect((await anonymous().get('/api/v1/health')).headers['cache-control']).toBe('no-store');
  });
});
