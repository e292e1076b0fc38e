import { DEMO_CIRCUITS, DEMO_PASSWORD, DEMO_USERS } from '../../demo/plant';

export { DEMO_CIRCUITS, DEMO_PASSWORD };

export function demoUser(role: (typeof DEMO_USERS)[number]['role']): { email: string; name: string } {
  const user = DEMO_USERS.find((u) => u.role === role);
  if (!user) throw new Error(`no demo user for ${role}`);
  return user;
}
