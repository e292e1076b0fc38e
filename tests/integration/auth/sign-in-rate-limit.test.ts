import { setTimeout as sleep } from 'node:timers/promises';
import { describe, expect, it } from 'vitest';
import { createSignInLimiter } from '@/lib/auth/rate-limit';
import { verifyCredentials } from '@/lib/auth/verify-credentials';
import { AuditEvent } from '@/models';
import { createTestWorkspace } from '../fixtures';

describe('sign-in rate limiting (PostgreSQL counters)', () => {
  it('refuses the N+1th attempt, even with the right password, until the window has passed', async () => {
    const ws = await createTestWorkspace('limit');
    const { email, id } = ws.users.engineer;
    const limiter = createSignInLimiter({ perAccount: 3, perAddress: 50, windowSeconds: 2 }, `t${Date.now()}`);
    const attempt = (password: string) => verifyCredentials({ email, password }, { address: '203.0.113.7', limiter });

    for (let i = 0; i < 3; i += 1) expect(await attempt('wrong-password')).toBeNull();
    await expect(attempt('fixture-password-123')).rejects.toMatchObject({ code: 'rate_limited:sign_in', message: expect.stringMatching(/Too many sign-in attempts/) });

    await sleep(2200);
    expect(await attempt('fixture-password-123')).toMatchObject({ id, email });
    expect(await AuditEvent.count({ where: { action: 'auth.sign_in_failed', actorId: id } })).toBe(3);
  });

  it('limits per client address across accounts', async () => {
    const ws = await createTestWorkspace('limit-ip');
    const limiter = createSignInLimiter({ perAccount: 50, perAddress: 2, windowSeconds: 60 }, `ip${Date.now()}`);
    const address = '198.51.100.9';
    expect(await verifyCredentials({ email: ws.users.viewer.email, password: 'nope-nope-nope' }, { address, limiter })).toBeNull();
    expect(await verifyCredentials({ email: ws.users.reviewer.email, password: 'nope-nope-nope' }, { address, limiter })).toBeNull();
    await expect(verifyCredentials({ email: ws.users.owner.email, password: 'fixture-password-123' }, { address, limiter })).rejects.toMatchObject({ code: 'rate_limited:sign_in' });
    expect(await verifyCredentials({ email: ws.users.owner.email, password: 'fixture-password-123' }, { address: '198.51.100.10', limiter })).toMatchObject({ id: ws.users.owner.id });
  });
});
