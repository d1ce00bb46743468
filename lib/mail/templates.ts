import 'server-only';
const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

export function invitationMail(p: { teamName: string; inviterName: string; role: string; link: string }) {
  const subject = `You're invited to ${p.teamName} on Pourproof`;
  const text = [
    `${p.inviterName} invited you to join ${p.teamName} on Pourproof as ${p.role}.`,
    '',
    `Accept the invitation and choose a password here:`,
    p.link,
    '',
    'The link works for 7 days. If you did not expect this, ignore this e-mail.',
  ].join('\n');
  const html = `<p>${esc(p.inviterName)} invited you to join <strong>${esc(p.teamName)}</strong> on Pourproof as <strong>${esc(p.role)}</strong>.</p><p><a href="${esc(p.link)}">Accept the invitation</a></p><p>The link works for 7 days. If you did not expect this, ignore this e-mail.</p>`;
  return { subject, text, html };
}
