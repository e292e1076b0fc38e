import { describe, expect, it } from 'vitest';
import { POST as CONFIRM } from '@/app/api/account/password-reset/confirm/route';
import { POST as REQUEST } from '@/app/api/account/password-reset/request/route';
import { confirmPasswordReset, RESET_TOKEN_LIFETIME_MS } from '@/lib/accounts/password-reset';
import { verifyCredentials } from '@/lib/auth/verify-credentials';
import { createSignInLimiter } from '@/lib/auth/rate-limit';
import { hashToken } from '@/lib/auth/tokens';
import { PasswordResetToken, User } from '@/models';
import { apiRequest, createTestWorkspace } from '../fixtures';
import { mailTo, tokenFromLink } from '../mail';

const noContext = {} as never;
const limiter = () => createSignInLimiter({ perAccount: 100, perAddress: 100, windowSeconds: 60 }, `reset-${Date.now()}`);

describe('password reset round trip', () => {
  it('e-mails a single-use link whose token is stored only as a hash', async () => {
    const ws = await createTestWorkspace('reset');
    const { email, id } = ws.users.technician;
    const requested = await REQUEST(await apiRequest('/api/account/password-reset/request', { method: 'POST', body: { email } }), noContext);
    expect(requested.status).toBe(202);

    const [message] = await mailTo(email);
    expect(message?.subject).toMatch(/reset/i);
    expect(message?.html).toContain('/reset-password?token=');
    const token = tokenFromLink(message!, '/reset-password');
    const stored = await PasswordResetToken.findOne({ where: { userId: id } });
    expect(stored?.tokenHash).toBe(hashToken(token));
    expect(stored?.tokenHash).not.toContain(token);

    const confirmed = await CONFIRM(await apiRequest('/api/account/password-reset/confirm', { method: 'POST', body: { token, password: 'fresh-reset-pass-77' } }), noContext);
    expect(confirmed.status).toBe(200);
    expect(await verifyCredentials({ email, password: 'fresh-reset-pass-77' }, { limiter: limiter() })).toMatchObject({ id });
    expect(await verifyCredentials({ email, password: 'fixture-password-123' }, { limiter: limiter() })).toBeNull();

    const reused = await CONFIRM(await apiRequest('/api/account/password-reset/confirm', { method: 'POST', body: { token, password: 'another-pass-8888' } }), noContext);
    expect(reused.status).toBe(400);
    expect(await reused.json()).toMatchObject({ error: { field: 'token' } });
  });

  it('answers an unknown address the same way and sends nothing', async () => {
    const email = 'nobody-here@test.example';
    const response = await REQUEST(await apiRequest('/api/account/password-reset/request', { method: 'POST', body: { email } }), noContext);
    expect(response.status).toBe(202);
    expect(await mailTo(email)).toHaveLength(0);
  });

  it('refuses an expired token and leaves the password as it was', async () => {
    const ws = await createTestWorkspace('reset-exp');
    const { email } = ws.users.viewer;
    await REQUEST(await apiRequest('/api/account/password-reset/request', { method: 'POST', body: { email } }), noContext);
    const token = tokenFromLink((await mailTo(email))[0]!, '/reset-password');
    const later = new Date(Date.now() + RESET_TOKEN_LIFETIME_MS + 1000);
    await expect(confirmPasswordReset({ token, password: 'too-late-pass-123', now: later })).rejects.toMatchObject({ code: 'invalid:token' });
    const user = await User.findOne({ where: { email } });
    expect(await verifyCredentials({ email, password: 'fixture-password-123' }, { limiter: limiter() })).toMatchObject({ id: user!.id });
  });
});
