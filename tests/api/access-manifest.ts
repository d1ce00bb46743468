// Every route handler of the app, with who may call it: the one manifest the
// authorization matrix (access-matrix.test.ts) is generated from. A route file
// whose methods are not all listed here fails that test.
//
// role: the lowest role that passes the gate; 'public' needs no session.
// id: the kind of record the path names (':id'), looked up in the caller's team.
// body: for mutating routes, a body that passes validation, so a caller who is
// let through reaches the record lookup (a missing or foreign id then answers
// 404); for routes without an id it may also be invalid (answered 400, after the gate).

export type Role = 'viewer' | 'maker' | 'lead' | 'owner';
export type IdKind = 'match' | 'pour' | 'batch' | 'photo' | 'colorant' | 'mold' | 'invitation';

export type RouteEntry = {
  method: 'GET' | 'POST' | 'PATCH' | 'DELETE';
  path: string;
  role: Role | 'public' | 'sdk';
  id?: IdKind;
  body?: unknown;
  multipart?: boolean;
};

const shape = { type: 'rect', x: 0.1, y: 0.1, w: 0.2, h: 0.2 };
const zones = [{ name: 'back', shape }];

export const ROUTES: RouteEntry[] = [
  { method: 'GET', path: '/api/health', role: 'public' },
  { method: 'POST', path: '/api/auth/sign-in', role: 'public', body: {} },
  { method: 'POST', path: '/api/auth/sign-up', role: 'public', body: {} },
  { method: 'POST', path: '/api/auth/sign-out', role: 'public' },
  { method: 'GET', path: '/api/me', role: 'viewer' },
  { method: 'POST', path: '/api/team/invitations', role: 'owner', body: {} },
  { method: 'DELETE', path: '/api/team/invitations/:id', role: 'owner', id: 'invitation' },
  { method: 'POST', path: '/api/team/invitations/:id/resend', role: 'owner', id: 'invitation' },
  { method: 'GET', path: '/api/team/export', role: 'owner' },
  { method: 'GET', path: '/api/dev/mailbox', role: 'owner' },
  { method: 'POST', path: '/api/delta-e', role: 'viewer', body: {} },
  { method: 'POST', path: '/api/measure', role: 'viewer', multipart: true },
  { method: 'GET', path: '/api/photos', role: 'viewer' },
  { method: 'POST', path: '/api/photos', role: 'maker', multipart: true },
  { method: 'GET', path: '/api/photos/:id', role: 'viewer', id: 'photo' },
  { method: 'GET', path: '/api/photos/:id/image', role: 'viewer', id: 'photo' },
  { method: 'GET', path: '/api/colorants', role: 'viewer' },
  { method: 'POST', path: '/api/colorants', role: 'lead', body: {} },
  { method: 'PATCH', path: '/api/colorants/:id', role: 'lead', id: 'colorant', body: { notes: 'matrix' } },
  { method: 'DELETE', path: '/api/colorants/:id', role: 'lead', id: 'colorant' },
  { method: 'GET', path: '/api/colorants/characterisation', role: 'viewer' },
  { method: 'POST', path: '/api/colorants/:id/swatches', role: 'maker', id: 'colorant', body: { photoId: 'matrix-photo', shape, amount: 1, unit: 'drops' } },
  { method: 'GET', path: '/api/colorants/:id/stock', role: 'viewer', id: 'colorant' },
  { method: 'POST', path: '/api/colorants/:id/stock', role: 'lead', id: 'colorant', body: { kind: 'delivery', amount: 1, note: 'matrix' } },
  { method: 'POST', path: '/api/colorants/import', role: 'lead', body: {} },
  { method: 'POST', path: '/api/molds/import', role: 'lead', body: {} },
  { method: 'GET', path: '/api/export/colorants', role: 'viewer' },
  { method: 'GET', path: '/api/export/molds', role: 'viewer' },
  { method: 'GET', path: '/api/export/standards', role: 'viewer' },
  { method: 'GET', path: '/api/export/batches', role: 'viewer' },
  { method: 'GET', path: '/api/molds', role: 'viewer' },
  { method: 'POST', path: '/api/molds', role: 'lead', body: {} },
  { method: 'PATCH', path: '/api/molds/:id', role: 'lead', id: 'mold', body: { name: 'Matrix mold' } },
  { method: 'DELETE', path: '/api/molds/:id', role: 'lead', id: 'mold' },
  { method: 'GET', path: '/api/matches', role: 'viewer' },
  { method: 'POST', path: '/api/matches', role: 'maker', body: {} },
  { method: 'GET', path: '/api/matches/:id', role: 'viewer', id: 'match' },
  { method: 'PATCH', path: '/api/matches/:id', role: 'maker', id: 'match', body: { notes: 'matrix' } },
  { method: 'GET', path: '/api/matches/:id/history', role: 'viewer', id: 'match' },
  { method: 'GET', path: '/api/matches/:id/edits', role: 'viewer', id: 'match' },
  { method: 'POST', path: '/api/matches/:id/draft-photo', role: 'maker', id: 'match', body: { photoId: 'matrix-photo' } },
  { method: 'DELETE', path: '/api/matches/:id/draft-photo', role: 'maker', id: 'match' },
  { method: 'POST', path: '/api/matches/:id/target', role: 'maker', id: 'match', body: { photoId: 'matrix-photo', zones } },
  { method: 'GET', path: '/api/matches/:id/pours', role: 'viewer', id: 'match' },
  { method: 'POST', path: '/api/matches/:id/pours', role: 'maker', id: 'match', body: { photoId: 'matrix-photo', recipe: [], zones } },
  { method: 'GET', path: '/api/matches/:id/batches', role: 'viewer', id: 'match' },
  { method: 'POST', path: '/api/matches/:id/batches', role: 'maker', id: 'match', body: { photoId: 'matrix-photo', zones, cups: 1 } },
  { method: 'POST', path: '/api/matches/:id/archive', role: 'lead', id: 'match' },
  { method: 'POST', path: '/api/matches/:id/reopen', role: 'lead', id: 'match' },
  { method: 'POST', path: '/api/matches/:id/starting-recipe', role: 'viewer', id: 'match', body: {} },
  { method: 'GET', path: '/api/pours/:id', role: 'viewer', id: 'pour' },
  { method: 'GET', path: '/api/pours/:id/suggestion', role: 'viewer', id: 'pour' },
  { method: 'POST', path: '/api/pours/:id/submit', role: 'maker', id: 'pour', body: {} },
  { method: 'POST', path: '/api/pours/:id/sign-off', role: 'lead', id: 'pour', body: { decision: 'rework', comment: 'matrix check' } },
  { method: 'GET', path: '/api/standards', role: 'viewer' },
  { method: 'GET', path: '/api/sign-off-queue', role: 'viewer' },
  { method: 'GET', path: '/api/batches', role: 'viewer' },
  { method: 'GET', path: '/api/batches/:id', role: 'viewer', id: 'batch' },
  { method: 'GET', path: '/api/batches/:id/sheet', role: 'viewer', id: 'batch' },
  // The UploadThing SDK's own route: its file router asks for a maker itself.
  { method: 'GET', path: '/api/uploadthing', role: 'sdk' },
  { method: 'POST', path: '/api/uploadthing', role: 'sdk' },
];

// Server actions, posted from their pages (lib/http/action.ts is their door).
export type ActionEntry = { page: string; form: string; role: Role | 'public'; action: string };

export const ACTIONS: ActionEntry[] = [
  { page: '/team', form: 'Team settings', role: 'owner', action: 'saveTeamSettings' },
  { page: '/team', form: 'Change role', role: 'owner', action: 'changeRoleAction' },
  { page: '/team', form: 'Remove', role: 'owner', action: 'removeMemberAction' },
  { page: '/invite/:token', form: 'Join', role: 'public', action: 'acceptInvitationAction' },
];
