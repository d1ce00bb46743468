'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Field, TextInput } from '@/components/ui/field';
import { FormError } from '@/components/ui/form-error';
import { apiFetch } from '@/lib/http/client';

const schema = z.object({
  email: z.string().trim().min(1, 'Enter your e-mail'),
  password: z.string().min(1, 'Enter your password'),
});

export function SignInForm() {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<z.infer<typeof schema>>({ resolver: zodResolver(schema) });
  const onSubmit = handleSubmit(async (values) => {
    setError(null);
    try {
      await apiFetch('/api/auth/sign-in', { method: 'POST', body: JSON.stringify(values) });
      router.replace('/matches');
      router.refresh();
    } catch (e) {
      setError((e as Error).message);
    }
  });
  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      <h1 className="text-xl font-semibold">Sign in</h1>
      <FormError message={error} />
      <Field label="E-mail" error={formState.errors.email?.message}>
        <TextInput type="email" autoComplete="username" {...register('email')} />
      </Field>
      <Field label="Password" error={formState.errors.password?.message}>
        <TextInput type="password" autoComplete="current-password" {...register('password')} />
      </Field>
      <Button type="submit" className="w-full" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
