'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Field, TextInput, inputClass } from '@/components/ui/field';
import { FormError } from '@/components/ui/form-error';
import { ROLES } from '@/lib/enums';
import { apiFetch } from '@/lib/http/client';
import { invitationSchema } from '@/lib/validations/auth';

type Values = z.input<typeof invitationSchema>;

export function InviteForm() {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [sent, setSent] = useState<string | null>(null);
  const { register, handleSubmit, formState, reset } = useForm<Values>({ resolver: zodResolver(invitationSchema), defaultValues: { role: 'maker' } });
  const onSubmit = handleSubmit(async (values) => {
    setError(null);
    setSent(null);
    try {
      const inv = await apiFetch<{ email: string; role: string }>('/api/team/invitations', { method: 'POST', body: JSON.stringify(values) });
      setSent(`Invitation sent to ${inv.email} as ${inv.role}.`);
      reset({ email: '', role: values.role });
      router.refresh();
    } catch (e) {
      setError((e as Error).message);
    }
  });
  return (
    <form onSubmit={onSubmit} className="grid gap-3 sm:grid-cols-[1fr_10rem_auto] sm:items-end" noValidate>
      <div className="sm:col-span-3"><FormError message={error} /></div>
      <Field label="E-mail" error={formState.errors.email?.message}>
        <TextInput type="email" {...register('email')} />
      </Field>
      <Field label="Role" error={formState.errors.role?.message}>
        <select {...register('role')} className={inputClass}>
          {ROLES.map((r) => <option key={r} value={r}>{r}</option>)}
        </select>
      </Field>
      <Button type="submit" disabled={formState.isSubmitting}>Invite</Button>
      {sent ? <p role="status" className="text-sm text-ink-soft sm:col-span-3">{sent}</p> : null}
    </form>
  );
}
