import 'server-only';
// The sign-off and production messages: sign-off requested (to leads and
// owners), decision (to the maker), batch failed QC (to leads and owners).
// Every message has a plain-text part; the html part says the same, simply.

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

export type ZoneFigure = { name: string; dE00: number; band: string };

// ΔE00 to two decimals in detail (PRODUCT.md, "The readout"), with its band
// word; the bands are common rules of thumb, not a standard.
export const zoneLine = (z: ZoneFigure, tolerance: number) =>
  `${z.name}: ΔE00 ${z.dE00.toFixed(2)} (${z.band}${z.dE00 <= tolerance ? '' : ', over tolerance'})`;

function htmlZones(zones: ZoneFigure[], tolerance: number) {
  return `<ul>${zones.map((z) => `<li>${esc(zoneLine(z, tolerance))}</li>`).join('')}</ul>`;
}

export function signOffRequestedMail(p: {
  matchName: string;
  pourNumber: number;
  makerName: string;
  tolerance: number;
  zones: ZoneFigure[];
  note: string | null;
  link: string;
}) {
  const subject = `Sign-off requested: ${p.matchName}, pour #${p.pourNumber}`;
  const text = [
    `${p.makerName} asks for sign-off on pour #${p.pourNumber} of ${p.matchName}.`,
    '',
    `ΔE00 per zone against the target (tolerance ${p.tolerance.toFixed(1)}):`,
    ...p.zones.map((z) => `  ${zoneLine(z, p.tolerance)}`),
    ...(p.note ? ['', `Note: ${p.note}`] : []),
    '',
    'Approve it or send it back for rework here:',
    p.link,
    '',
    'Bands: ≤ 1.0 indistinguishable, ≤ 2.0 close, ≤ 3.5 noticeable, above that off (rules of thumb, not a standard).',
  ].join('\n');
  const html =
    `<p>${esc(p.makerName)} asks for sign-off on <strong>pour #${p.pourNumber}</strong> of <strong>${esc(p.matchName)}</strong>.</p>` +
    `<p>ΔE00 per zone against the target (tolerance ${p.tolerance.toFixed(1)}):</p>${htmlZones(p.zones, p.tolerance)}` +
    (p.note ? `<p>Note: ${esc(p.note)}</p>` : '') +
    `<p><a href="${esc(p.link)}">Open the pour to approve it or send it back</a></p>`;
  return { subject, text, html };
}

export function decisionMail(p: {
  matchName: string;
  pourNumber: number;
  decision: 'approved' | 'rework';
  leadName: string;
  comment: string | null;
  link: string;
}) {
  const approved = p.decision === 'approved';
  const subject = `${approved ? 'Approved' : 'Rework'}: ${p.matchName}, pour #${p.pourNumber}`;
  const verdict = approved
    ? `${p.leadName} approved pour #${p.pourNumber} of ${p.matchName}. Its recipe is now the match's standard.`
    : `${p.leadName} sent pour #${p.pourNumber} of ${p.matchName} back for rework.`;
  const text = [verdict, ...(p.comment ? ['', `Comment: ${p.comment}`] : []), '', 'Open the pour:', p.link].join('\n');
  const html =
    `<p>${esc(verdict)}</p>` +
    (p.comment ? `<p>Comment: ${esc(p.comment)}</p>` : '') +
    `<p><a href="${esc(p.link)}">Open the pour</a></p>`;
  return { subject, text, html };
}

export function batchFailedMail(p: {
  matchName: string;
  standardNumber: number;
  cups: number;
  loggedBy: string;
  tolerance: number;
  zones: ZoneFigure[];
  link: string;
}) {
  const subject = `Batch failed QC: ${p.matchName}`;
  const intro = `A production batch of ${p.matchName} (${p.cups} cups, logged by ${p.loggedBy}) is outside the tolerance of ${p.tolerance.toFixed(1)} ΔE00 against the standard, pour #${p.standardNumber}.`;
  const text = [
    intro,
    '',
    'ΔE00 per zone against the standard:',
    ...p.zones.map((z) => `  ${zoneLine(z, p.tolerance)}`),
    '',
    'Open the batch:',
    p.link,
  ].join('\n');
  const html =
    `<p>${esc(intro)}</p><p>ΔE00 per zone against the standard:</p>${htmlZones(p.zones, p.tolerance)}` +
    `<p><a href="${esc(p.link)}">Open the batch</a></p>`;
  return { subject, text, html };
}
