import { SignInForm } from './sign-in-form';

export const metadata = { title: 'Sign in' };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string }> }) {
  const { next } = await searchParams;
  // Only same-site paths are followed after sign-in.
  const target = next && next.startsWith('/') && !next.startsWith('//') ? next : '/';
  return <SignInForm next={target} />;
}
