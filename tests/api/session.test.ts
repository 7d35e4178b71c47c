import http from 'node:http';
import { QueryTypes } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { User } from '../../models';
import { pruneSignInThrottles } from '../../server/services/auth/sign-in-throttle';
import { createUser, TEST_PASSWORD, testDb, unique } from '../helpers/db';
import { startAnotherApp } from '../helpers/app-process';
import { anonymous, signedIn } from '../helpers/http';

// A JSON POST from a chosen local address (supertest cannot choose one); answers the status.
function postFrom(localAddress: string, url: string, body: unknown, headers: Record<string, string>): Promise<number> {
  return new Promise((resolve, reject) => {
    const req = http.request(url, { method: 'POST', localAddress, headers: { 'Content-Type': 'application/json', ...headers } }, (res) => {
      res.resume();
      resolve(res.statusCode ?? 0);
    });
    req.on('error', reject);
    req.end(JSON.stringify(body));
  });
}

describe('session API', () => {
  it('signs in with e-mail and password and sets a sealed httpOnly SameSite=Lax cookie', async () => {
    const user = await createUser('planner');
    const agent = anonymous();
    const res = await agent.post('/api/v1/session').send({ email: user.email.toUpperCase(), password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ user: { id: user.id, email: user.email, name: user.name, role: 'planner' } });
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/tf_session=Fe26\.2\*/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=lax/i);
    expect(cookie).not.toMatch(/Secure/i); // plain http in tests; SECURE_COOKIES=1 behind https
    const me = await agent.get('/api/v1/session');
    expect(me.status).toBe(200);
    expect(me.body.user.id).toBe(user.id);
  });

  it('ends the session on DELETE', async () => {
    const { agent } = await signedIn('operator');
    expect((await agent.delete('/api/v1/session')).status).toBe(204);
    const me = await agent.get('/api/v1/session');
    expect(me.status).toBe(401);
    expect(me.body.error.code).toBe('unauthorized');
  });

  it('answers wrong credentials with 401 invalid_credentials and the same message for unknown accounts', async () => {
    const user = await createUser('clerk');
    const wrong = await anonymous().post('/api/v1/session').send({ email: user.email, password: 'not the password' });
    const unknown = await anonymous()
      .post('/api/v1/session')
      .send({ email: `${unique('nobody')}@example.test`, password: 'whatever' });
    expect(wrong.status).toBe(401);
    expect(wrong.body.error.code).toBe('invalid_credentials');
    expect(unknown.status).toBe(401);
    expect(unknown.body.error.message).toBe(wrong.body.error.message);
  });

  it.each([
    ['malformed JSON', '{"email":', 'invalid_json', undefined],
    ['a missing password', { email: 'a@example.test' }, 'validation_failed', 'password'],
    ['a number for the e-mail', { email: 42, password: 'x' }, 'validation_failed', 'email'],
    ['a bad e-mail', { email: 'not-an-address', password: 'x' }, 'validation_failed', 'email'],
    ['an array body', [1, 2], 'validation_failed', '_'],
  ])('rejects %s with 400', async (_label, body, code, field) => {
    const req = anonymous().post('/api/v1/session').set('Content-Type', 'application/json');
    const res = await req.send(typeof body === 'string' ? body : JSON.stringify(body));
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe(code);
    if (field) expect(res.body.error.fields[field]).toBeTruthy();
  });

  it('refuses a switched-off account and ends its open session at once', async () => {
    const { agent, userId, email } = await signedIn('operator');
    await User.update({ active: false }, { where: { id: userId } });
    expect((await agent.get('/api/v1/session')).status).toBe(401);
    const again = await anonymous().post('/api/v1/session').send({ email, password: TEST_PASSWORD });
    expect(again.status).toBe(401);
  });

  const someAddress = (prefix: string) => `${prefix}.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}`;
  const tryPassword = (email: string, password: string, address: string) =>
    anonymous().post('/api/v1/session').set('X-Forwarded-For', address).send({ email, password });

  it('blocks an account from the address that sent 5 wrong passwords; its owner still signs in from another', async () => {
    testDb();
    const user = await createUser('quality');
    const address = someAddress('10.99');
    for (let i = 0; i < 5; i++) expect((await tryPassword(user.email, `wrong-${i}`, address)).status).toBe(401);
    const blocked = await tryPassword(user.email, TEST_PASSWORD, address);
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('rate_limited');
    expect(blocked.body.error.message).toMatch(/Try again in \d+ minute/);
    expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);
    expect((await tryPassword(user.email, TEST_PASSWORD, someAddress('10.96'))).status).toBe(200);
  });

  it('lets exactly 5 of 40 parallel wrong passwords from one address be checked; the rest are refused', async () => {
    const user = await createUser('planner');
    const address = someAddress('10.95');
    const answers = await Promise.all(Array.from({ length: 40 }, (_, i) => tryPassword(user.email, `guess-${i}`, address)));
    const statuses = answers.map((r) => r.status).sort();
    expect(statuses.filter((s) => s === 401)).toHaveLength(5);
    expect(statuses.filter((s) => s === 429)).toHaveLength(35);
  });

  it('slows an account that wrong passwords from many addresses hit, but takes its right password', async () => {
    const user = await createUser('clerk');
    for (let i = 0; i < 11; i++) expect((await tryPassword(user.email, `spray-${i}`, someAddress('10.94'))).status).toBe(401);
    const started = Date.now();
    const owner = await tryPassword(user.email, TEST_PASSWORD, someAddress('10.93'));
    expect(owner.status).toBe(200);
    // Eleven wrong passwords are one over the quiet limit of ten: the owner waited the one-second step.
    expect(Date.now() - started).toBeGreaterThanOrEqual(1_000);
    // Signing in starts the account clean again.
    const next = Date.now();
    expect((await tryPassword(user.email, TEST_PASSWORD, someAddress('10.93'))).status).toBe(200);
    expect(Date.now() - next).toBeLessThan(1_000);
  });

  it('blocks an address after 20 tries across different accounts; right passwords do not count', async () => {
    const address = someAddress('10.98');
    const user = await createUser('planner');
    for (let i = 0; i < 3; i++) expect((await tryPassword(user.email, TEST_PASSWORD, address)).status).toBe(200);
    for (let i = 0; i < 20; i++) expect((await tryPassword(`${unique('spray')}@example.test`, 'guess', address)).status).toBe(401);
    const blocked = await tryPassword(user.email, TEST_PASSWORD, address);
    expect(blocked.status).toBe(429);
    expect((await tryPassword(user.email, TEST_PASSWORD, someAddress('10.97'))).status).toBe(200);
  });

  it('prunes sign-in counts a day past their window, keeping live ones and blocks still in force', async () => {
    const db = testDb();
    const tag = unique('prune');
    const rows = [
      [`address:${tag}-old`, 'UTC_TIMESTAMP() - INTERVAL 2 DAY', 'NULL'],
      [`address:${tag}-fresh`, 'UTC_TIMESTAMP()', 'NULL'],
      [`address:${tag}-blocked`, 'UTC_TIMESTAMP() - INTERVAL 2 DAY', 'UTC_TIMESTAMP() + INTERVAL 1 HOUR'],
    ];
    for (const [key, start, blocked] of rows) {
      await db.query(`INSERT INTO sign_in_throttles (scope_key, failures, window_start, blocked_until) VALUES (?, 3, ${start}, ${blocked})`, {
        replacements: [key],
      });
    }
    expect(await pruneSignInThrottles()).toBeGreaterThanOrEqual(1);
    const left = await db.query<{ scope_key: string }>('SELECT scope_key FROM sign_in_throttles WHERE scope_key LIKE ? ORDER BY scope_key', {
      replacements: [`address:${tag}%`],
      type: QueryTypes.SELECT,
    });
    expect(left.map((r) => r.scope_key)).toEqual([`address:${tag}-blocked`, `address:${tag}-fresh`]);
  });

  it('believes X-Forwarded-For only from a trusted proxy: without one, a client cannot pick its address', { timeout: 60_000 }, async () => {
    const app = await startAnotherApp({ TRUSTED_PROXIES: '' });
    try {
      const user = await createUser('operator');
      // Sent from a loopback address of this test's own, so its tries count against no one else's.
      const from = someAddress('127.0');
      const send = (password: string, claimed: string) =>
        postFrom(from, `${app.url}/api/v1/session`, { email: user.email, password }, { 'X-Forwarded-For': claimed });
      for (let i = 0; i < 5; i++) expect(await send(`wrong-${i}`, `10.92.0.${i}`)).toBe(401);
      // Every try came from the same socket address, whatever the header said: that pair is blocked.
      expect(await send(TEST_PASSWORD, '10.92.1.1')).toBe(429);
      expect((await tryPassword(user.email, TEST_PASSWORD, someAddress('10.91'))).status).toBe(200);
    } finally {
      app.child.kill('SIGKILL');
    }
  });

  it('refuses state-changing requests sent from another site', async () => {
    const user = await createUser('planner');
    const res = await anonymous().post('/api/v1/session').set('Origin', 'https://evil.example').send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('cross_site');
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('does not take X-Forwarded-Host as this site: a forged one beside a foreign Origin is refused', async () => {
    const user = await createUser('planner');
    const res = await anonymous()
      .post('/api/v1/session')
      .set('Origin', 'https://evil.example')
      .set('X-Forwarded-Host', 'evil.example')
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('cross_site');
  });
});
