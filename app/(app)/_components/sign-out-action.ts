'use server';

import { redirect } from 'next/navigation';
import { signOut } from '@/lib/server/auth/sign-out';

/** The shell's Sign out button. Any signed-in role may sign out, so it needs no role check. */
export async function signOutAction() {
  await signOut();
  redirect('/login');
}
