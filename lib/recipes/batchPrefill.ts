// What a run plan hands to the batch form, carried in the match page's URL
// (?log=batch&cups=6&zoneCups=back:4,belly:2&plan=<moldId>:5,<moldId>:3), so
// "Log as batch" is a plain link. Cups are always cups here.
export type BatchPrefill = { cups: number | null; zoneCups: { zone: string; cups: number }[] | null; plan: { moldId: string; shots: number }[] | null; moldId: string | null };

const pairs = (s: string | null) =>
  (s ?? '').split(',').map((p) => p.split(':')).filter((p): p is [string, string] => p.length === 2 && p[0]!.length > 0).map(([k, v]) => [decodeURIComponent(k), Number(v)] as const)
    .filter(([, v]) => Number.isFinite(v));

export function encodeBatchPrefill(p: BatchPrefill): string {
  const q = new URLSearchParams({ log: 'batch' });
  if (p.cups !== null) q.set('cups', String(Number(p.cups.toFixed(4))));
  if (p.zoneCups?.length) q.set('zoneCups', p.zoneCups.map((z) => `${encodeURIComponent(z.zone)}:${Number(z.cups.toFixed(4))}`).join(','));
  if (p.plan?.length) q.set('plan', p.plan.map((l) => `${encodeURIComponent(l.moldId)}:${l.shots}`).join(','));
  if (p.moldId) q.set('mold', p.moldId);
  return q.toString();
}

export function decodeBatchPrefill(q: { get(name: string): string | null }): BatchPrefill | null {
  if (q.get('log') !== 'batch') return null;
  const cups = Number(q.get('cups'));
  const zoneCups = pairs(q.get('zoneCups')).filter(([, v]) => v > 0).map(([zone, c]) => ({ zone, cups: c }));
  const plan = pairs(q.get('plan')).filter(([, v]) => Number.isInteger(v) && v > 0).map(([moldId, shots]) => ({ moldId, shots }));
  return { cups: cups > 0 ? cups : null, zoneCups: zoneCups.length ? zoneCups : null, plan: plan.length ? plan : null, moldId: q.get('mold') || null };
}
