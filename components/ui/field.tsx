import type { InputHTMLAttributes, ReactNode } from 'react';

export function Field({ label, error, hint, children }: { label: string; error?: string; hint?: ReactNode; children: ReactNode }) {
  return (
    <label className="block">
      <span className="mb-1 block text-sm font-medium">{label}</span>
      {children}
      {hint && !error ? <span className="mt-1 block text-sm text-ink-soft">{hint}</span> : null}
      {error ? <span role="alert" className="mt-1 block text-sm text-band-off">{error}</span> : null}
    </label>
  );
}

export const inputClass =
  'block w-full min-h-tap rounded-md border border-panel-line bg-white px-3 text-base text-ink placeholder:text-ink-soft/70 focus:border-accent';

export function TextInput(props: InputHTMLAttributes<HTMLInputElement>) {
  return <input {...props} className={`${inputClass} ${props.className ?? ''}`} />;
}
