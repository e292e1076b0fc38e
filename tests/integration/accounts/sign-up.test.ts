import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { POST } from '@/app/api/account/sign-up/route';
import { verifyPassword } from '@/lib/auth/password';
import { getSequelize } from '@/lib/db';
import { User } from '@/models';
import { apiRequest } from '../fixtures';

const noContext = {} as never;
const unique = () => `new-${randomUUID().slice(0, 8)}@test.example`;
const userCount = async () => { getSequelize(); return User.count(); };

describe('POST /api/account/sign-up', () => {
  it('creates an account with a bcrypt-hashed password', async () => {
    const email = unique();
    const response = await POST(await apiRequest('/api/account/sign-up', { method: 'POST', body: { name: 'Nia Fenwick', email: email.toUpperCase(), password: 'clamp-valve-9431' } }), noContext);
    expect(response.status).toBe(201);
    expect(await response.json()).toMatchObject({ user: { email, name: 'Nia Fenwick' } });
    const user = await User.findOne({ where: { email } });
    expect(user?.passwordHash).not.toContain('clamp-valve-9431');
    expect(await verifyPassword('clamp-valve-9431', user!.passwordHash)).toBe(true);
  });

  it.each([
    ['a short password', { password: 'short1' }, 'password'],
    ['a common password', { password: 'password123' }, 'password'],
    ['a password made of the e-mail', { password: 'EMAIL' }, 'password'],
    ['a malformed e-mail', { email: 'not-an-address' }, 'email'],
    ['a missing name', { name: '' }, 'name'],
  ])('refuses %s, naming the field, and creates nothing', async (_label, override, field) => {
    const email = unique();
    const body = { name: 'Ada Quill', email, password: 'long-enough-pass-1', ...override };
    if (body.password === 'EMAIL') body.password = `${email}`;
    const before = await userCount();
    const response = await POST(await apiRequest('/api/account/sign-up', { method: 'POST', body }), noContext);
    expect(response.status).toBe(400);
    expect(((await response.json()) as { error: { field: string } }).error.field).toBe(field);
    expect(await userCount()).toBe(before);
  });

  it('refuses an address that already has an account with 409 on the email field', async () => {
    const email = unique();
    const body = { name: 'First', email, password: 'first-account-pass' };
    expect((await POST(await apiRequest('/api/account/sign-up', { method: 'POST', body }), noContext)).status).toBe(201);
    const again = await POST(await apiRequest('/api/account/sign-up', { method: 'POST', body: { ...body, name: 'Second' } }), noContext);
    expect(again.status).toBe(409);
    expect(await again.json()).toMatchObject({ error: { code: 'conflict:email', field: 'email' } });
  });
});
