import Link from 'next/link';
import { SignUpForm } from '@/components/auth/sign-up-form';

export const metadata = { title: 'Create your shop' };

export default function SignUpPage() {
  return (
    <>
      <SignUpForm />
      <p className="mt-4 text-sm">
        Already have an account? <Link href="/sign-in" className="font-medium text-accent underline">Sign in</Link>
      </p>
    </>
  );
}
