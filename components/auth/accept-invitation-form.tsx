'use client';

import { useActionState } from 'react';
import type { ActionState } from '@/lib/http/action';
import { Button } from '@/components/ui/button';
import { Field, TextInput } from '@/components/ui/field';
import { FormError } from '@/components/ui/form-error';

export function AcceptInvitationForm({ action }: { action: (prev: ActionState, form: FormData) => Promise<ActionState> }) {
  const [state, formAction, pending] = useActionState(action, null);
  return (
    <form action={formAction} className="space-y-4">
      <FormError message={state?.message} />
      <Field label="Your name" error={state?.fieldErrors?.name?.[0]}>
        <TextInput name="name" autoComplete="name" required />
      </Field>
      <Field label="Choose a password" error={state?.fieldErrors?.password?.[0]} hint="At least 10 characters.">
        <TextInput name="password" type="password" autoComplete="new-password" required minLength={10} />
      </Field>
      <Button type="submit" className="w-full" disabled={pending}>
        Join the shop
      </Button>
    </form>
  );
}
