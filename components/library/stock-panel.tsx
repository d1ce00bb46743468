'use client';

import Link from 'next/link';
import { useEffect, useRef, useState } from 'react';
import useSWR from 'swr';
import { When } from '@/components/ui/when';
import { Button } from '@/components/ui/button';
import { Field, inputClass } from '@/components/ui/field';
import { FormError } from '@/components/ui/form-error';
import type { MovementView } from '@/db/queries/stock';
import type { DoseUnit } from '@/db/schema';
import { apiFetch, swrFetcher } from '@/lib/http/client';
import { amountOf } from './format';

type Stock = { id: string; name: string; unit: DoseUnit; stock: number | null; lowStockAt: number | null; low: boolean; movements: MovementView[] };

const KIND: Record<string, string> = { batch: 'batch', pour: 'test pour', adjustment: 'adjustment', delivery: 'delivery' };

// One colorant's shelf: its stock, the low-stock mark, the last movements of
// the ledger, and (leads, owners) a delivery or an adjustment with a note.
export function StockPanel({ colorantId, canEdit, onClose, onMoved }: { colorantId: string; canEdit: boolean; onClose: () => void; onMoved: () => void }) {
  const key = `/api/colorants/${colorantId}/stock`;
  const { data, error, mutate } = useSWR<Stock>(key, swrFetcher);
  const [kind, setKind] = useState<'delivery' | 'adjustment'>('delivery');
  const [amount, setAmount] = useState('');
  const [note, setNote] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const ref = useRef<HTMLElement>(null);
  useEffect(() => ref.current?.scrollIntoView({ block: 'start' }), [colorantId]);

  async function record(e: React.FormEvent) {
    e.preventDefault();
    setProblem(null);
    const n = Number(amount);
    if (!amount.trim() || !Number.isFinite(n) || n === 0) return setProblem('Give an amount other than 0.');
    setBusy(true);
    try {
      await apiFetch(key, { method: 'POST', body: JSON.stringify({ kind, amount: n, note }) });
      setAmount('');
      setNote('');
      await mutate();
      onMoved();
    } catch (err) {
      setProblem((err as Error).message);
    } finally {
      setBusy(false);
    }
  }

  return (
    <section ref={ref} aria-label="Stock" className="scroll-mt-4 space-y-3 rounded-lg border border-panel-line bg-white p-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 className="text-lg font-semibold">Stock{data ? `: ${data.name}` : ''}</h2>
        <Button type="button" variant="secondary" onClick={onClose}>Close</Button>
      </div>
      {error ? <p role="alert" className="text-band-off">Could not load the stock: {(error as Error).message}</p> : null}
      {!data && !error ? <p role="status" className="text-ink-soft">Loading…</p> : null}
      {data ? (
        <>
          <p className="num text-xl font-semibold">
            {data.stock === null ? 'Not kept' : amountOf(data.stock, data.unit)}
            {data.low ? <span className="ml-2 text-base"><LowMark /></span> : null}
          </p>
          <p className="text-sm text-ink-soft">{data.lowStockAt === null ? 'No low-stock mark set (edit the colorant to set one).' : `Marked low below ${amountOf(data.lowStockAt, data.unit)}.`} Batches draw their doses from here; a batch may take it below zero, and says so.</p>
          {data.movements.length ? (
            <div className="overflow-x-auto">
              <table className="w-full text-left text-sm" aria-label="Last movements">
                <thead><tr className="text-ink-soft"><th className="py-1">When</th><th>What</th><th className="text-right">Amount</th><th className="text-right">Left</th></tr></thead>
                <tbody>
                  {data.movements.map((m) => (
                    <tr key={m.id} className="border-t border-panel-line align-top">
                      <td className="num py-1 pr-2"><When at={m.createdAt} dayOnly /></td>
                      <td className="pr-2">{m.batchId ? <Link href={`/batches/${m.batchId}/sheet`} className="underline underline-offset-4">{KIND[m.kind]}</Link> : KIND[m.kind]}{m.note ? ` — ${m.note}` : ''}{m.by ? <span className="block text-xs text-ink-soft">{m.by}</span> : null}</td>
                      <td className="num whitespace-nowrap text-right">{m.amount > 0 ? '+' : '−'}{amountOf(Math.abs(m.amount), data.unit)}</td>
                      <td className="num whitespace-nowrap pl-2 text-right">{amountOf(m.balance, data.unit)}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          ) : <p className="text-sm text-ink-soft">No movements yet.</p>}
          {canEdit ? (
            <form onSubmit={record} aria-label="Record a stock movement" className="grid gap-3 sm:grid-cols-3">
              <Field label="Movement">
                <select value={kind} onChange={(e) => setKind(e.target.value as 'delivery' | 'adjustment')} className={inputClass}>
                  <option value="delivery">Delivery (adds)</option>
                  <option value="adjustment">Adjustment (+ or −)</option>
                </select>
              </Field>
              <Field label={`Amount (${data.unit === 'ml' ? 'mL' : data.unit})`}>
                <input type="number" inputMode="decimal" step="any" value={amount} onChange={(e) => setAmount(e.target.value)} className={inputClass} />
              </Field>
              <Field label="Note">
                <input value={note} onChange={(e) => setNote(e.target.value)} placeholder={kind === 'delivery' ? 'supplier, order' : 'recount, spill…'} className={inputClass} />
              </Field>
              <div className="sm:col-span-3"><FormError message={problem} /></div>
              <div><Button type="submit" disabled={busy}>{busy ? 'Saving…' : 'Record'}</Button></div>
            </form>
          ) : null}
        </>
      ) : null}
    </section>
  );
}

// Low stock as a word and a shape, not a colour alone.
export function LowMark() {
  return <span className="inline-flex items-center gap-1 rounded border border-ink px-1.5 text-xs font-semibold uppercase tracking-wide"><span aria-hidden>▼</span>low</span>;
}
