import { Link, useNavigate, useParams } from 'react-router-dom';
import { describeError, isApiError } from '../api/ApiError';
import { useMe } from '../api/auth';
import { useAcceptInvitation, useInvitation } from '../api/invitations';
import { ErrorPanel } from '../components/ErrorPanel';
import { FormAlert, FormNotice } from '../components/FormAlert';
import { Loading } from '../components/Loading';
import { useCurrentOrganization } from '../hooks/useCurrentOrganization';
import { useDocumentTitle } from '../hooks/useDocumentTitle';
import { ROLE_INFO } from '../lib/roles';

/**
 * /invite/:token — the link from an invitation e-mail. Shows who invites you and with which role;
 * signed out, it offers sign-in or sign-up and both come back here afterwards.
 */
export function InvitationPage() {
  useDocumentTitle('Invitation');
  const { token = '' } = useParams();
  const invitation = useInvitation(token);
  const me = useMe();
  const accept = useAcceptInvitation(token);
  const { select } = useCurrentOrganization();
  const navigate = useNavigate();

  if (invitation.isPending) return <Loading what="the invitation" />;
  if (invitation.isError) {
    if (isApiError(invitation.error) && invitation.error.status === 404) {
      return (
        <>
          <h1 className="mb-3 text-[1.25rem]">Invitation not found</h1>
          <p className="text-ink-muted">
            This link does not match any invitation. Check that the whole link was copied, or ask
            for a new invitation.
          </p>
        </>
      );
    }
    return <ErrorPanel error={invitation.error} what="the invitation" />;
  }

  const { organization, role, email, expired, accepted } = invitation.data;
  const here = `/invite/${encodeURIComponent(token)}`;
  const signedOut = isApiError(me.error) && me.error.status === 401;

  function onAccept() {
    accept.mutate(undefined, {
      onSuccess: (result) => {
        select(result.organization.id);
        navigate('/sheets');
      },
    });
  }

  return (
    <>
      <h1 className="mb-4 text-[1.25rem]">Invitation to {organization.name}</h1>
      <dl className="mb-5 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1.5 border-y border-paper-line py-3">
        <dt className="text-ink-muted">Organization</dt>
        <dd className="font-medium">{organization.name}</dd>
        <dt className="text-ink-muted">Role</dt>
        <dd>
          <span className="font-medium">{ROLE_INFO[role].label}</span>
          <span className="text-ink-muted"> — {ROLE_INFO[role].duty}</span>
        </dd>
        <dt className="text-ink-muted">For</dt>
        <dd className="font-mono break-all">{email}</dd>
      </dl>

      {accepted ? (
        <FormNotice>
          This invitation has already been accepted.{' '}
          <Link to="/sheets" className="underline">
            Go to sheets
          </Link>
        </FormNotice>
      ) : expired ? (
        <FormAlert title="This invitation has expired">
          Ask an owner of {organization.name} to invite you again.
        </FormAlert>
      ) : me.isPending ? (
        <Loading what="your account" />
      ) : signedOut ? (
        <>
          <p className="mb-4">
            Sign in or create an account to accept. You will come back here afterwards.
          </p>
          <div className="flex flex-wrap gap-2">
            <Link
              to={`/signin?next=${encodeURIComponent(here)}&email=${encodeURIComponent(email)}`}
              className="btn btn-primary"
            >
              Sign in
            </Link>
            <Link
              to={`/signup?next=${encodeURIComponent(here)}&email=${encodeURIComponent(email)}`}
              className="btn"
            >
              Create an account
            </Link>
          </div>
        </>
      ) : me.data ? (
        <>
          {accept.isError ? (
            <FormAlert title="The invitation was not accepted">
              {describeError(accept.error)}
            </FormAlert>
          ) : null}
          <p className="mb-4">
            You are signed in as <span className="font-mono">{me.data.user.email}</span>.
          </p>
          <button
            type="button"
            className="btn btn-primary"
            onClick={onAccept}
            disabled={accept.isPending}
          >
            {accept.isPending ? 'Joining…' : `Join ${organization.name}`}
          </button>
        </>
      ) : (
        <ErrorPanel error={me.error} what="your account" />
      )}
    </>
  );
}
