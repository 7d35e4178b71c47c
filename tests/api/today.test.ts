import { describe, expect, it } from 'vitest';
import { ROLES } from '../../lib/roles';
import { signedIn } from '../helpers/http';

describe('Today page', () => {
  it.each(ROLES)('renders for a %s', async (role) => {
    const { agent } = await signedIn(role);
    const res = await agent.get('/');
    expect(res.status).toBe(200);
    expect(res.text).toContain('Waiting for you');
    expect(res.text).not.toContain('This page could not be shown');
  });
});
