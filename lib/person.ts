import type { User } from '@/models';

/** How a user appears in API responses: never the e-mail address. */
export interface Person {
  id: string;
  name: string;
}

export function personOf(user: Pick<User, 'id' | 'name'>): Person {
  return { id: user.id, name: user.name };
}
