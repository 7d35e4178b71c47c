import { describe, expect, it } from 'vitest';
import { MailMessage, PasswordToken, User } from '../../models';
import { HIDDEN_SECRET } from '../../server/mail/mask-secrets';
import { TEST_PASSWORD, testDb, unique } from '../helpers/db';
import { anonymous, signedIn } from '../helpers/http';
import { waitForMail } from '../helpers/mail';

function linkToken(text: string): string {
  const match = text.match(/\/set-password\?token=([A-Za-z0-9_-]+)/);
  if (!match) throw new Error(`no set-password link in:\n${text}`);
  return match[1];
}

describe('people (admin)', () => {
  it('invites by e-mail with a one-time link that sets the password and signs the person in', async () => {
    const { agent } = await signedIn('admin');
    const email = `${unique('new')}@example.test`;
    const res = await agent.post('/api/v1/users').send({ name: 'Rosa Lindqvist', email, role: 'clerk' });
    expect(res.status).toBe(201);
    expect(res.body.user).toMatchObject({ email, role: 'clerk', status: 'invited', active: true });
    expect(res.body.mail).toBe('sent');

    const [mail] = await waitForMail(email);
    expect(mail.subject).toBe('You are invited to Tallyforge');
    expect(mail.text).toContain('Stockroom clerk');
    const token = linkToken(mail.text);

    const newcomer = anonymous();
    const accepted = await newcomer.post('/api/v1/invitations/accept').send({ token, password: 'a long enough secret' });
    expect(accepted.status).toBe(200);
    expect((await newcomer.get('/api/v1/session')).body.user.email).toBe(email);

    const reused = await anonymous().post('/api/v1/invitations/accept').send({ token, password: 'another long secret' });
    expect(reused.status).toBe(422);
    expect(reused.body.error.fields.token).toBeTruthy();
  });

  it('refuses an expired invitation link', async () => {
    const { agent } = await signedIn('admin');
    const email = `${unique('late')}@example.test`;
    await agent.post('/api/v1/users').send({ name: 'Late Comer', email, role: 'operator' });
    const token = linkToken((await waitForMail(email))[0].text);
    testDb();
    const user = await User.findOne({ where: { email } });
    await PasswordToken.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { userId: user!.id } });
    const res = await anonymous().post('/api/v1/invitations/accept').send({ token, password: 'a long enough secret' });
    expect(res.status).toBe(422);
  });

  it('rejects bad invitations with field messages and writes nothing', async () => {
    const { agent } = await signedIn('admin');
    const email = `${unique('bad')}@example.test`;
    const res = await agent.post('/api/v1/users').send({ name: '', email, role: 'wizard' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['name', 'role']);
    testDb();
    expect(await User.count({ where: { email } })).toBe(0);
  });

  it('answers a second invitation to the same e-mail with 409', async () => {
    const { agent } = await signedIn('admin');
    const email = `${unique('twice')}@example.test`;
    expect((await agent.post('/api/v1/users').send({ name: 'Once', email, role: 'operator' })).status).toBe(201);
    const again = await agent.post('/api/v1/users').send({ name: 'Twice', email, role: 'planner' });
    expect(again.status).toBe(409);
    expect(again.body.error.fields.email).toBeTruthy();
  });

  it('changes a role with optimistic locking: a stale version gets 409; the new role is taken up by signing in again', async () => {
    const admin = await signedIn('admin');
    const other = await signedIn('operator');
    const list = await admin.agent.get('/api/v1/users');
    const row = list.body.users.find((u: { id: number }) => u.id === other.userId);
    const first = await admin.agent.patch(`/api/v1/users/${other.userId}`).send({ role: 'clerk', version: row.version });
    expect(first.status).toBe(200);
    expect(first.body.user.role).toBe('clerk');
    const stale = await admin.agent.patch(`/api/v1/users/${other.userId}`).send({ role: 'planner', version: row.version });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('stale_version');
    // The session signed in with the old role ended with the change.
    expect((await other.agent.get('/api/v1/session')).status).toBe(401);
    const again = await anonymous().post('/api/v1/session').send({ email: other.email, password: TEST_PASSWORD });
    expect(again.body.user.role).toBe('clerk');
  });

  it('switching someone off ends their session; an admin cannot switch off themselves', async () => {
    const admin = await signedIn('admin');
    const other = await signedIn('planner');
    const users = (await admin.agent.get('/api/v1/users')).body.users as Array<{ id: number; version: number }>;
    const target = users.find((u) => u.id === other.userId)!;
    const off = await admin.agent.patch(`/api/v1/users/${other.userId}`).send({ active: false, version: target.version });
    expect(off.status).toBe(200);
    expect(off.body.user.status).toBe('inactive');
    expect((await other.agent.get('/api/v1/session')).status).toBe(401);
    const me = users.find((u) => u.id === admin.userId)!;
    const self = await admin.agent.patch(`/api/v1/users/${admin.userId}`).send({ active: false, version: me.version });
    expect(self.status).toBe(422);
  });

  it('sends a fresh link on request, and the old one stops working', async () => {
    const { agent } = await signedIn('admin');
    const email = `${unique('again')}@example.test`;
    const created = await agent.post('/api/v1/users').send({ name: 'Twice Asked', email, role: 'quality' });
    const firstToken = linkToken((await waitForMail(email))[0].text);
    expect((await agent.post(`/api/v1/users/${created.body.user.id}/invitation`)).status).toBe(200);
    const mails = await waitForMail(email, 2);
    const secondToken = linkToken(mails[1].text);
    expect(secondToken).not.toBe(firstToken);
    expect((await anonymous().post('/api/v1/invitations/accept').send({ token: firstToken, password: 'a long enough secret' })).status).toBe(422);
    expect((await anonymous().post('/api/v1/invitations/accept').send({ token: secondToken, password: 'a long enough secret' })).status).toBe(200);
  });

  it('keeps a log of sent mail that admins can read, with the one-time link masked: only the inbox has it', async () => {
    const { agent } = await signedIn('admin');
    const email = `${unique('logged')}@example.test`;
    await agent.post('/api/v1/users').send({ name: 'Logged Person', email, role: 'operator' });
    const token = linkToken((await waitForMail(email))[0].text);
    const res = await agent.get('/api/v1/mail');
    expect(res.status).toBe(200);
    const logged = res.body.messages.find((m: { to: string }) => m.to === email);
    expect(logged).toMatchObject({ status: 'sent', kind: 'invitation' });
    expect(logged.text).toContain('Logged Person');
    expect(logged.text).toContain(HIDDEN_SECRET);
    expect(logged.text).not.toContain(token);
    expect(logged.text).not.toContain('set-password');
    const row = await MailMessage.findByPk(logged.id);
    expect(row!.bodyText).not.toContain(token);
  });

  it('sends someone who has a password a reset link only they receive; their password works until they use it', async () => {
    const admin = await signedIn('admin');
    const person = await signedIn('clerk');
    const res = await admin.agent.post(`/api/v1/users/${person.userId}/invitation`);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ mail: 'sent', kind: 'password_reset' });
    const [mail] = await waitForMail(person.email);
    expect(mail.subject).toBe('Choose a new Tallyforge password');
    const token = linkToken(mail.text);
    const logged = (await admin.agent.get('/api/v1/mail')).body.messages.find((m: { to: string }) => m.to === person.email);
    expect(logged).toMatchObject({ kind: 'password_reset' });
    expect(logged.text).not.toContain(token);

    // Until the link is used nothing changes: the old password signs in, the old session works.
    expect((await anonymous().post('/api/v1/session').send({ email: person.email, password: TEST_PASSWORD })).status).toBe(200);
    expect((await person.agent.get('/api/v1/session')).status).toBe(200);
    expect((await anonymous().post('/api/v1/invitations/accept').send({ token, password: 'a brand new long secret' })).status).toBe(200);
    expect((await person.agent.get('/api/v1/session')).status).toBe(401);
    expect((await anonymous().post('/api/v1/session').send({ email: person.email, password: TEST_PASSWORD })).status).toBe(401);
  });
});
