'use server';

import { redirect } from 'next/navigation';
import { endSession, endSessionsOf, getCurrentUser } from '@/server/auth/session';

export async function signOutAction(): Promise<void> {
  await endSession();
  redirect('/sign-in');
}

// Every session of the signed-in person ends (a tablet left signed in elsewhere), this one too.
export async function signOutEverywhereAction(): Promise<void> {
  const user = await getCurrentUser();
  if (user) await endSessionsOf(user.id, 'signed_out_everywhere');
  await endSession();
  redirect('/sign-in');
}
