import { db } from '@/db';
import { listTeamMembers } from '@/db/queries/members';
import { getTeamSettings } from '@/db/queries/teams';
import { InviteForm } from '@/components/team/invite-form';
import { SettingsForm } from '@/components/team/settings-form';
import { InvitationActions } from '@/components/team/invitation-actions';
import { When } from '@/components/ui/when';
import { timeZoneList } from '@/lib/format/dates';
import { MemberRowActions } from '@/components/team/member-row-actions';
import { requirePageMember } from '@/lib/auth/current';
import { listOpenInvitations } from '@/lib/team/invitations';
import { changeRoleAction, removeMemberAction } from './actions';
import { saveTeamSettings } from './settings-actions';

export const metadata = { title: 'Team' };

export default async function TeamPage() {
  const member = await requirePageMember();
  const isOwner = member.role === 'owner';
  const members = listTeamMembers(db(), member.team.id);
  const invites = isOwner ? listOpenInvitations(db(), member.team.id) : [];
  return (
    <section className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold">Team</h1>
        <p className="mt-1 text-ink-soft">{member.team.name}: owners manage the team, leads sign off pours, makers pour and log, viewers read.</p>
      </div>
      <div className="overflow-x-auto rounded-lg border border-panel-line bg-white">
        <table className="w-full text-left text-sm" aria-label="Members">
          <thead className="bg-panel-deep">
            <tr><th className="p-3">Member</th><th className="p-3">Role</th>{isOwner ? <th className="p-3">Manage</th> : null}</tr>
          </thead>
          <tbody>
            {members.map((m) => (
              <tr key={m.userId} className="border-t border-panel-line align-top">
                <td className="p-3">
                  <span className="block font-medium">{m.name}{m.userId === member.user.id ? ' (you)' : ''}</span>
                  <span className="block break-words text-ink-soft">{m.email}</span>
                </td>
                <td className="p-3">{m.role}</td>
                {isOwner ? (
                  <td className="p-3">
                    {m.userId === member.user.id ? <span className="text-ink-soft">—</span> : (
                      <MemberRowActions userId={m.userId} role={m.role} name={m.name} changeRole={changeRoleAction} remove={removeMemberAction} />
                    )}
                  </td>
                ) : null}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {isOwner ? (
        <div className="rounded-lg border border-panel-line bg-white p-4">
          <h2 className="mb-3 text-lg font-semibold">Invite a member</h2>
          <InviteForm />
          {invites.length ? (
            <div className="mt-4">
              <h3 className="text-sm font-semibold">Waiting for an answer</h3>
              <ul className="mt-1 space-y-2 text-sm" aria-label="Pending invitations">
                {invites.map((i) => (
                  <li key={i.id} className="flex flex-wrap items-center justify-between gap-2">
                    <span className="text-ink-soft">{i.email} as {i.role}, until <When at={i.expiresAt} dayOnly /></span>
                    <InvitationActions id={i.id} email={i.email} />
                  </li>
                ))}
              </ul>
            </div>
          ) : null}
        </div>
      ) : null}
      {isOwner ? (
        <div className="rounded-lg border border-panel-line bg-white p-4">
          <h2 className="mb-3 text-lg font-semibold">Shop settings</h2>
          <SettingsForm settings={getTeamSettings(db(), member.team.id)!} timeZones={timeZoneList()} action={saveTeamSettings} />
        </div>
      ) : null}
      {isOwner ? (
        <div className="rounded-lg border border-panel-line bg-white p-4">
          <h2 className="text-lg font-semibold">Your shop's data</h2>
          <p className="mt-1 text-sm text-ink-soft">
            Everything the shop keeps in Pourproof — members, colorants, molds, matches, pours with their recipes and colours, sign-offs, standards,
            batches and links to every photo — as one JSON file you can keep or take elsewhere.
          </p>
          <a href="/api/team/export" download className="mt-3 inline-flex min-h-tap items-center rounded-md border border-panel-line bg-white px-4 font-medium hover:bg-panel">
            Download everything (JSON)
          </a>
        </div>
      ) : null}
    </section>
  );
}
