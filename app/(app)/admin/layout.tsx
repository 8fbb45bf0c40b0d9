import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';

// Checked here before anything renders, so a wrong role gets a real 403 status.
// Pages, actions and route handlers still check for themselves.
export default async function Layout({ children }: { children: React.ReactNode }) {
  await requireUser(SECTION_ROLES.admin);
  return children;
}
