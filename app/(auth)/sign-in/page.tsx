import Link from 'next/link';
import { redirect } from 'next/navigation';
import { SignInForm } from '@/components/auth/sign-in-form';
import { getCurrentMember } from '@/lib/auth/current';

export const metadata = { title: 'Sign in' };

export default async function SignInPage() {
  if (await getCurrentMember()) redirect('/matches');
  return (
    <>
      <SignInForm />
      <p className="mt-4 text-sm">
        New shop? <Link href="/sign-up" className="font-medium text-accent underline">Create your shop</Link>
      </p>
    </>
  );
}
