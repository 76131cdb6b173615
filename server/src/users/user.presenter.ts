import type { UserView } from '@upwell/common';
import type { User } from './user.entity';

/** The public face of a person: never the hash or token version. */
export function presentUser(user: User): UserView {
  return { id: user.id, name: user.name, email: user.email };
}
