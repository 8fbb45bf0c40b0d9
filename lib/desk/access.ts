// Who does what at the desk. Drivers open the desk too (SECTION_ROLES) but see and dispute only
// their own carrier's cases.
import type { Role } from '@/lib/auth/roles';

/** Settle cases, read the reports, release holds: the terminal's clerks and admins. */
export const DESK_STAFF = ['clerk', 'admin'] as const satisfies readonly Role[];

export const isDeskStaff = (role: Role): boolean => (DESK_STAFF as readonly Role[]).includes(role);
