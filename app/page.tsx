import { redirect } from 'next/navigation';
import { homeFor } from '@/lib/auth/roles';
import { currentUser } from '@/lib/server/auth';

export default async function Home() {
  const user = await currentUser();
  redirect(user ? homeFor(user.role) : '/login');
}
