import { describe, expect, it } from 'vitest';
import { anonymous, signedIn } from '../helpers/http';

describe('security headers', () => {
  it('sends a nonce-based Content-Security-Policy with each page, and the page scripts carry that nonce', async () => {
    const { agent } = await signedIn('planner');
    const res = await agent.get('/');
    expect(res.status).toBe(200);
    const csp = String(res.headers['content-security-policy']);
    const nonce = csp.match(/'nonce-([^']+)'/)?.[1];
    expect(nonce).toBeTruthy();
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("object-src 'none'");
    const scripts = [...res.text.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
    expect(scripts.length).toBeGreaterThan(0);
    for (const tag of scripts) expect(tag).toContain(`nonce="${nonce}"`);
    const again = await agent.get('/');
    expect(String(again.headers['content-security-policy'])).not.toContain(nonce!);
  });

  it('sends the usual hardening headers and no framework banner', async () => {
    const res = await anonymous().get('/sign-in');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-frame-options']).toBe('DENY');
    expect(res.headers['referrer-policy']).toBe('same-origin');
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  it('tags every answer with a request id for the logs, keeping one the caller sent', async () => {
    expect((await anonymous().get('/api/v1/health')).headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
    expect((await anonymous().get('/api/v1/health').set('X-Request-Id', 'bench-7-retry')).headers['x-request-id']).toBe('bench-7-retry');
  });
});
