import 'server-only';
import { refuse } from '@/lib/result';
import type { SessionUser } from '../auth';

/** Who does a yard command: the signed-in user, of whom the yard needs the id and home terminal. */
export type YardActor = Pick<SessionUser, 'id' | 'terminalId'>;

/** Every yard command works in the actor's home terminal; an account without one is refused. */
export const NO_TERMINAL = refuse('not_found', 'Your account has no home terminal; ask an admin to set one.');
