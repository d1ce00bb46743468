'use client';

import { useState } from 'react';
import type { FieldValues, UseFormSetError } from 'react-hook-form';
import { apiFetch } from '@/lib/http/client';
import { showServerError } from './server-error';

// Saving a library entry: POST a new one or PATCH an existing one, a short
// confirmation after adding, and server errors put under the field they name.
export function useEntrySubmit<V extends FieldValues, O, Row extends { name: string }>(opts: {
  base: string;
  id?: string;
  fields: readonly string[];
  setFieldError: UseFormSetError<V>;
  onSaved: (row: Row) => void | Promise<void>;
  afterAdd: (values: O) => void;
}) {
  const [error, setError] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const submit = async (values: O) => {
    setError(null);
    setSaved(null);
    try {
      const row = await apiFetch<Row>(opts.id ? `${opts.base}/${opts.id}` : opts.base, { method: opts.id ? 'PATCH' : 'POST', body: JSON.stringify(values) });
      if (!opts.id) {
        opts.afterAdd(values);
        setSaved(`Added “${row.name}” to the library.`);
      }
      await opts.onSaved(row);
    } catch (e) {
      setError(showServerError(e, opts.setFieldError, opts.fields) || null);
    }
  };
  return { error, saved, submit };
}
