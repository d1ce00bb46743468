'use client';

import { useActionState } from 'react';
import type { ActionState } from '@/lib/http/action';
import { ROLES } from '@/lib/enums';

type Action = (prev: ActionState, form: FormData) => Promise<ActionState>;

export function MemberRowActions({ userId, role, name, changeRole, remove }: { userId: string; role: string; name: string; changeRole: Action; remove: Action }) {
  const [roleState, roleAction, rolePending] = useActionState(changeRole, null);
  const [removeState, removeAction, removePending] = useActionState(remove, null);
  const msg = roleState?.message ?? removeState?.message;
  const failed = roleState?.ok === false || removeState?.ok === false;
  return (
    <div className="flex flex-wrap items-center gap-2">
      <form action={roleAction} className="flex flex-wrap items-center gap-2">
        <input type="hidden" name="userId" value={userId} />
        <label className="sr-only" htmlFor={`role-${userId}`}>Role of {name}</label>
        <select id={`role-${userId}`} name="role" defaultValue={role} className="min-h-tap rounded-md border border-panel-line bg-white px-2">
          {ROLES.map((r) => <option key={r} value={r}>{r}</option>)}
        </select>
        <button type="submit" disabled={rolePending} className="min-h-tap rounded-md border border-panel-line bg-white px-3 font-medium hover:bg-panel">Change role</button>
      </form>
      <form action={removeAction} onSubmit={(e) => { if (!confirm(`Remove ${name} from the shop?`)) e.preventDefault(); }}>
        <input type="hidden" name="userId" value={userId} />
        <button type="submit" disabled={removePending} className="min-h-tap rounded-md border border-band-off/40 bg-white px-3 font-medium text-band-off">Remove</button>
      </form>
      {msg ? <span role={failed ? 'alert' : 'status'} className={`text-sm ${failed ? 'text-band-off' : 'text-ink-soft'}`}>{msg}</span> : null}
    </div>
  );
}
