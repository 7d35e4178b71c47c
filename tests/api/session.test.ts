import { describe, expect, it } from 'vitest';
import { User } from '../../models';
import { createUser, TEST_PASSWORD, testDb, unique } from '../helpers/db';
import { anonymous, signedIn } from '../helpers/http';

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
    const unknown = await anonymous().post('/api/v1/session').send({ email: `${unique('nobody')}@example.test`, password: 'whatever' });
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

  it('blocks an account after 5 failed sign-ins, even with the right password, and says so', async () => {
    testDb();
    const user = await createUser('quality');
    const address = `10.99.${Math.floor(Math.random() * 250)}.1`;
    for (let i = 0; i < 5; i++) {
      const res = await anonymous().post('/api/v1/session').set('X-Forwarded-For', address).send({ email: user.email, password: `wrong-${i}` });
      expect(res.status).toBe(401);
    }
    const blocked = await anonymous().post('/api/v1/session').set('X-Forwarded-For', address).send({ email: user.email, password: TEST_PASSWORD });
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('rate_limited');
    expect(blocked.body.error.message).toMatch(/Try again in \d+ minute/);
    expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);
  });

  it('blocks an address after 20 failed sign-ins across different accounts', async () => {
    const address = `10.98.${Math.floor(Math.random() * 250)}.7`;
    for (let i = 0; i < 20; i++) {
      await anonymous().post('/api/v1/session').set('X-Forwarded-For', address).send({ email: `${unique('spray')}@example.test`, password: 'guess' });
    }
    const user = await createUser('planner');
    const blocked = await anonymous().post('/api/v1/session').set('X-Forwarded-For', address).send({ email: user.email, password: TEST_PASSWORD });
    expect(blocked.status).toBe(429);
    const elsewhere = await anonymous().post('/api/v1/session').set('X-Forwarded-For', '10.97.0.1').send({ email: user.email, password: TEST_PASSWORD });
    expect(elsewhere.status).toBe(200);
  });

  it('refuses state-changing requests sent from another site', async () => {
    const user = await createUser('planner');
    const res = await anonymous().post('/api/v1/session').set('Origin', 'https://evil.example').send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('cross_site');
    expect(res.headers['set-cookie']).toBeUndefined();
  });
});
