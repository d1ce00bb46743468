'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Field, TextInput } from '@/components/ui/field';
import { FormError } from '@/components/ui/form-error';
import { apiFetch } from '@/lib/http/client';
import { signUpSchema } from '@/lib/validations/auth';

type Values = z.input<typeof signUpSchema>;

export function SignUpForm() {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<Values>({ resolver: zodResolver(signUpSchema) });
  const onSubmit = handleSubmit(async (values) => {
    setError(null);
    try {
      await apiFetch('/api/auth/sign-up', { method: 'POST', body: JSON.stringify(values) });
      router.replace('/matches');
      router.refresh();
    } catch (e) {
      setError((e as Error).message);
    }
  });
  const err = formState.errors;
  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      <h1 className="text-xl font-semibold">Create your shop</h1>
      <FormError message={error} />
      <Field label="Shop name" error={err.teamName?.message}>
        <TextInput {...register('teamName')} />
      </Field>
      <Field label="Your name" error={err.name?.message}>
        <TextInput autoComplete="name" {...register('name')} />
      </Field>
      <Field label="E-mail" error={err.email?.message}>
        <TextInput type="email" autoComplete="username" {...register('email')} />
      </Field>
      <Field label="Password" error={err.password?.message} hint="At least 10 characters.">
        <TextInput type="password" autoComplete="new-password" {...register('password')} />
      </Field>
      <Button type="submit" className="w-full" disabled={formState.isSubmitting}>
        Create shop
      </Button>
    </form>
  );
}
