import { SetPasswordForm } from './set-password-form';

export const metadata = { title: 'Choose your password' };

export default async function SetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  return <SetPasswordForm token={token ?? ''} />;
}
