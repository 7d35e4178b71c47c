import { sealData, unsealData } from 'iron-session';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { User, UserSession } from '../../models';
import { createUser, TEST_PASSWORD, testDb } from '../helpers/db';
import { anonymous, baseUrl, signedIn } from '../helpers/http';
import { waitForMail } from '../helpers/mail';

// What an attacker holding a copy of a cookie gets: the cookie alone, sent as a header.
async function signInCookie(email: string, password = TEST_PASSWORD): Promise<string> {
  const res = await anonymous().post('/api/v1/session').send({ email, password });
  expect(res.status).toBe(200);
  const set = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
  return set.map((c) => c.split(';')[0]).find((c) => c.startsWith('tf_session='))!;
}

const versionOf = async (id: number) => {
  testDb();
  return (await User.findByPk(id))!.version;
};

const whoAmI = (cookie: string) => request(baseUrl()).get('/api/v1/session').set('Cookie', cookie);

describe('sessions the server ends', () => {
  it('a cookie copied before sign-out is refused after it (API sign-out and the page action alike end the row)', async () => {
    const user = await createUser('operator');
    const cookie = await signInCookie(user.email);
    expect((await whoAmI(cookie)).status).toBe(200);
    expect((await request(baseUrl()).delete('/api/v1/session').set('Cookie', cookie)).status).toBe(204);
    const replay = await whoAmI(cookie);
    expect(replay.status).toBe(401);
    expect((await request(baseUrl()).get('/api/v1/parts').set('Cookie', cookie)).status).toBe(401);
    testDb();
    expect(await UserSession.count({ where: { userId: user.id, endReason: 'signed_out' } })).toBe(1);
  });

  it('a new password ends every session signed in with the old one', async () => {
    const { agent: admin } = await signedIn('admin');
    const user = await createUser('clerk');
    const [a, b] = [await signInCookie(user.email), await signInCookie(user.email)];
    expect((await admin.post(`/api/v1/users/${user.id}/invitation`)).status).toBe(200);
    const [mail] = await waitForMail(user.email);
    const token = new URL(mail.text.match(/https?:\/\/\S+\/set-password\?token=\S+/)![0]).searchParams.get('token');
    const set = await anonymous().post('/api/v1/invitations/accept').send({ token, password: 'a brand new secret' });
    expect(set.status).toBe(200);
    expect((await whoAmI(a)).status).toBe(401);
    expect((await whoAmI(b)).status).toBe(401);
    expect((await whoAmI(await signInCookie(user.email, 'a brand new secret'))).status).toBe(200);
  });

  it('switching a person off ends their sessions for good: switched on again, the old cookie still fails', async () => {
    const { agent: admin } = await signedIn('admin');
    const user = await createUser('planner');
    const cookie = await signInCookie(user.email);
    const off = await admin.patch(`/api/v1/users/${user.id}`).send({ active: false, version: await versionOf(user.id) });
    expect(off.status).toBe(200);
    expect((await admin.patch(`/api/v1/users/${user.id}`).send({ active: true, version: off.body.user.version })).status).toBe(200);
    expect((await whoAmI(cookie)).status).toBe(401);
  });

  it('a role change ends the sessions signed in with the old role', async () => {
    const { agent: admin } = await signedIn('admin');
    const user = await createUser('planner');
    const cookie = await signInCookie(user.email);
    expect((await admin.patch(`/api/v1/users/${user.id}`).send({ role: 'operator', version: await versionOf(user.id) })).status).toBe(200);
    expect((await whoAmI(cookie)).status).toBe(401);
  });

  it('signs a person out everywhere: by themselves, or by an administrator', async () => {
    const user = await createUser('quality');
    const [a, b] = [await signInCookie(user.email), await signInCookie(user.email)];
    const everywhere = await request(baseUrl()).delete('/api/v1/session/everywhere').set('Cookie', a);
    expect(everywhere.status).toBe(200);
    expect(everywhere.body.ended).toBe(2);
    expect((await whoAmI(b)).status).toBe(401);

    const { agent: admin } = await signedIn('admin');
    const c = await signInCookie(user.email);
    const ended = await admin.delete(`/api/v1/users/${user.id}/sessions`);
    expect(ended.status).toBe(200);
    expect(ended.body.ended).toBe(1);
    expect((await whoAmI(c)).status).toBe(401);
    expect((await admin.delete('/api/v1/users/999999/sessions')).status).toBe(404);
  });

  it('ends a session at its absolute lifetime however busy it is, and starts new ones with the site setting', async () => {
    const { agent: admin } = await signedIn('admin');
    const { settings } = (await admin.get('/api/v1/settings')).body;
    expect(settings.sessionHours).toBe(12);
    const user = await createUser('operator');
    const cookie = await signInCookie(user.email);
    testDb();
    const row = (await UserSession.findOne({ where: { userId: user.id }, order: [['id', 'DESC']] }))!;
    // Fixed at sign-in: 12 h from then (a minute's slack for a slow machine).
    expect(Math.abs(row.expiresAt.getTime() - row.createdAt.getTime() - 12 * 3_600_000)).toBeLessThan(60_000);
    await row.update({ expiresAt: new Date(Date.now() - 1000) });
    expect((await whoAmI(cookie)).status).toBe(401);

    const bad = await admin.patch('/api/v1/settings').send({ sessionHours: 0, version: settings.version });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.sessionHours).toMatch(/At least 1/);
  });

  it('rolls the cookie forward for a client that only talks to the API, at most once a minute', async () => {
    const user = await createUser('operator');
    const cookie = await signInCookie(user.email);
    const password = process.env.SESSION_SECRET!;
    const data = await unsealData<{ sid: string; seenAt: number }>(decodeURIComponent(cookie.split('=')[1]), { password });
    // A fresh cookie is left as it is.
    expect((await whoAmI(cookie)).headers['set-cookie']).toBeUndefined();
    // Last rolled five minutes ago: the answer carries a cookie whose clock reads now.
    const older = `tf_session=${await sealData({ ...data, seenAt: Date.now() - 5 * 60_000 }, { password })}`;
    const res = await whoAmI(older);
    expect(res.status).toBe(200);
    const rolled = ([] as string[]).concat(res.headers['set-cookie'] ?? []).find((c) => c.startsWith('tf_session='));
    expect(rolled).toMatch(/HttpOnly/i);
    const fresh = await unsealData<{ sid: string; seenAt: number }>(decodeURIComponent(rolled!.split(';')[0].split('=')[1]), { password });
    expect(fresh.sid).toBe(data.sid);
    expect(Math.abs(fresh.seenAt - Date.now())).toBeLessThan(30_000);
  });
});
