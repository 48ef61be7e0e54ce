import { useState, type FormEvent } from 'react';
import { describeError } from '../api/ApiError';
import { useMe } from '../api/auth';
import { useChangeMemberRole, useInviteMember, useMembers, useRemoveMember } from '../api/members';
import { can, ROLES, type Member, type Membership, type Role } from '../api/types';
import { ErrorPanel } from '../components/ErrorPanel';
import { FormAlert, FormNotice } from '../components/FormAlert';
import { Loading } from '../components/Loading';
import { PageHeader } from '../components/PageHeader';
import { Paper } from '../components/Paper';
import { RequireOrganization } from '../components/RequireOrganization';
import { SelectField } from '../components/SelectField';
import { TextField } from '../components/TextField';
import { splitServerError } from '../forms/serverErrors';
import { checkEmail } from '../forms/validators';
import { useDocumentTitle } from '../hooks/useDocumentTitle';
import { formatDate } from '../lib/formatDateTime';
import { ROLE_INFO } from '../lib/roles';

/**
 * /members — who belongs to the organization and in which role. Everyone sees the list; only
 * owners see the controls to invite, change roles and remove (the server enforces the same).
 */
export function MembersPage() {
  useDocumentTitle('Members');
  return (
    <RequireOrganization>
      {(membership) => <MemberRoster membership={membership} />}
    </RequireOrganization>
  );
}

function MemberRoster({ membership }: { membership: Membership }) {
  const organizationId = membership.organization.id;
  // The same permission table the server decides with; hiding only spares people dead controls.
  const isOwner = can(membership.role, 'org.manageMembers');
  const members = useMembers(organizationId);
  const me = useMe();
  const changeRole = useChangeMemberRole(organizationId);
  const remove = useRemoveMember(organizationId);

  return (
    <div className="space-y-4">
      <Paper>
        <PageHeader
          title="Members"
          subtitle={`${membership.organization.name} · your role: ${ROLE_INFO[membership.role].label}`}
        />
        {changeRole.isError ? (
          <FormAlert title="The role was not changed">{describeError(changeRole.error)}</FormAlert>
        ) : null}
        {remove.isError ? (
          <FormAlert title="The member was not removed">{describeError(remove.error)}</FormAlert>
        ) : null}
        {members.isPending ? (
          <Loading what="members" />
        ) : members.isError ? (
          <ErrorPanel error={members.error} what="the members" />
        ) : (
          <div className="overflow-x-auto">
            <table className="ruled">
              <caption className="sr-only">Members of {membership.organization.name}</caption>
              <thead>
                <tr>
                  <th scope="col">Name</th>
                  <th scope="col">E-mail</th>
                  <th scope="col">Role</th>
                  <th scope="col">Joined</th>
                  {isOwner ? (
                    <th scope="col">
                      <span className="sr-only">Actions</span>
                    </th>
                  ) : null}
                </tr>
              </thead>
              <tbody>
                {members.data.members.map((member) => (
                  <MemberRow
                    key={member.user.id}
                    member={member}
                    isSelf={member.user.id === me.data?.user.id}
                    isOwner={isOwner}
                    onRole={(role) => changeRole.mutate({ userId: member.user.id, role })}
                    onRemove={() => remove.mutate({ userId: member.user.id })}
                    removing={remove.isPending && remove.variables?.userId === member.user.id}
                  />
                ))}
              </tbody>
            </table>
          </div>
        )}
      </Paper>

      {isOwner && members.data ? (
        <Paper>
          <h2 className="mb-3 text-[1rem]">Invitations</h2>
          {members.data.invitations.length === 0 ? (
            <p className="mb-4 text-ink-muted">No invitations waiting.</p>
          ) : (
            <table className="ruled mb-4">
              <caption className="sr-only">Invitations waiting for an answer</caption>
              <thead>
                <tr>
                  <th scope="col">E-mail</th>
                  <th scope="col">Role</th>
                  <th scope="col">Sent</th>
                  <th scope="col">Expires</th>
                </tr>
              </thead>
              <tbody>
                {members.data.invitations.map((invitation) => (
                  <tr key={invitation.id}>
                    <td className="font-mono">{invitation.email}</td>
                    <td>{ROLE_INFO[invitation.role].label}</td>
                    <td className="font-mono text-ink-muted">{formatDate(invitation.createdAt)}</td>
                    <td className="font-mono text-ink-muted">{formatDate(invitation.expiresAt)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          )}
          <InviteForm organizationId={organizationId} />
        </Paper>
      ) : null}
    </div>
  );
}

function MemberRow({
  member,
  isSelf,
  isOwner,
  onRole,
  onRemove,
  removing,
}: {
  member: Member;
  isSelf: boolean;
  isOwner: boolean;
  onRole: (role: Role) => void;
  onRemove: () => void;
  removing: boolean;
}) {
  const [confirming, setConfirming] = useState(false);
  const who = member.user.name || member.user.email;
  return (
    <tr>
      <td className="font-medium">
        {member.user.name || '—'}
        {isSelf ? <span className="ml-1.5 font-normal text-ink-muted">(you)</span> : null}
      </td>
      <td className="font-mono">{member.user.email}</td>
      <td>
        {isOwner ? (
          <select
            aria-label={`Role of ${who}`}
            className="input w-auto py-0.5"
            value={member.role}
            onChange={(e) => onRole(e.target.value as Role)}
          >
            {ROLES.map((role) => (
              <option key={role} value={role}>
                {ROLE_INFO[role].label}
              </option>
            ))}
          </select>
        ) : (
          ROLE_INFO[member.role].label
        )}
      </td>
      <td className="font-mono text-ink-muted">{formatDate(member.joinedAt)}</td>
      {isOwner ? (
        <td className="text-right whitespace-nowrap">
          {confirming ? (
            <span className="inline-flex items-center gap-2">
              <span className="text-ink-muted">Remove {who}?</span>
              <button
                type="button"
                className="btn btn-danger py-0.5"
                onClick={onRemove}
                disabled={removing}
              >
                {removing ? 'Removing…' : 'Yes, remove'}
              </button>
              <button type="button" className="btn py-0.5" onClick={() => setConfirming(false)}>
                Keep
              </button>
            </span>
          ) : (
            <button type="button" className="btn py-0.5" onClick={() => setConfirming(true)}>
              Remove<span className="sr-only"> {who}</span>
            </button>
          )}
        </td>
      ) : null}
    </tr>
  );
}

function InviteForm({ organizationId }: { organizationId: string }) {
  const invite = useInviteMember(organizationId);
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<Role>('engineer');
  const [error, setError] = useState<string | undefined>();
  const [sentTo, setSentTo] = useState<string | null>(null);

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const problem = checkEmail(email);
    setError(problem);
    setSentTo(null);
    if (problem) {
      (event.currentTarget.elements.namedItem('email') as HTMLInputElement | null)?.focus();
      return;
    }
    const address = email.trim();
    invite.mutate(
      { email: address, role },
      {
        onSuccess: () => {
          setSentTo(address);
          setEmail('');
        },
      },
    );
  }

  const server = splitServerError(invite.error, { email: 'E-mail', role: 'Role' });
  return (
    <>
      <h3 className="mb-2 font-semibold">Invite someone</h3>
      {sentTo ? (
        <FormNotice>
          Invitation sent to <span className="font-mono">{sentTo}</span>.
        </FormNotice>
      ) : null}
      {server.form ? (
        <FormAlert title="The invitation was not sent">{server.form}</FormAlert>
      ) : null}
      <form
        noValidate
        onSubmit={onSubmit}
        aria-label="Invite someone"
        className="flex flex-wrap items-start gap-3"
      >
        <TextField
          className="w-full max-w-xs"
          label="E-mail"
          name="email"
          type="email"
          autoComplete="off"
          value={email}
          onChange={(e) => setEmail(e.target.value)}
          error={error ?? server.field.email}
          required
        />
        <SelectField
          className="w-44"
          label="Role"
          name="role"
          value={role}
          onChange={(e) => setRole(e.target.value as Role)}
          error={server.field.role}
          hint={ROLE_INFO[role].duty}
        >
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_INFO[r].label}
            </option>
          ))}
        </SelectField>
        <button type="submit" className="btn btn-primary mt-[1.6rem]" disabled={invite.isPending}>
          {invite.isPending ? 'Sending…' : 'Send invitation'}
        </button>
      </form>
    </>
  );
}
