import { readFileSync } from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { startAnotherApp } from '../helpers/app-process';
import { createUser, TEST_PASSWORD } from '../helpers/db';
import { baseUrl, signedIn } from '../helpers/http';

// The one server action (sign out), by the id the build gave it.
function signOutActionId(): string {
  const manifest = JSON.parse(readFileSync(path.resolve(__dirname, '../../.next/server/server-reference-manifest.json'), 'utf8'));
  const ids = Object.entries(manifest.node as Record<string, { exportedName?: string }>)
    .filter(([, v]) => v.exportedName === 'signOutAction')
    .map(([id]) => id);
  expect(ids).toHaveLength(1);
  return ids[0];
}

describe('cookies behind https, and server actions from another site', () => {
  it('marks the session cookie Secure when SECURE_COOKIES=1 (behind a TLS proxy)', { timeout: 60_000 }, async () => {
    const app = await startAnotherApp({ SECURE_COOKIES: '1' });
    try {
      const user = await createUser('clerk');
      const res = await request(app.url).post('/api/v1/session').send({ email: user.email, password: TEST_PASSWORD });
      expect(res.status).toBe(200);
      const cookie = String(res.headers['set-cookie']);
      expect(cookie).toMatch(/tf_session=Fe26\.2\*/);
      expect(cookie).toMatch(/;\s*Secure/i);
      expect(cookie).toMatch(/HttpOnly/i);
    } finally {
      app.child.kill('SIGTERM');
    }
  });

  it('refuses a server action from another site with 403: a cross-site sign-out does nothing, a same-site one works', async () => {
    const { agent } = await signedIn('operator');
    const action = (origin: string) =>
      agent.post('/').set('Next-Action', signOutActionId()).set('Origin', origin).set('Content-Type', 'text/plain;charset=UTF-8').send('[]');

    const forged = await action('https://evil.example');
    expect(forged.status).toBe(403);
    expect(forged.headers['set-cookie'] ?? []).not.toContainEqual(expect.stringMatching(/^tf_session=;/));
    expect((await agent.get('/api/v1/session')).status).toBe(200);

    const own = await action(baseUrl());
    expect(own.status).toBeLessThan(400);
    expect((await agent.get('/api/v1/session')).status).toBe(401);
  });
});
