import { Link, useLocation } from 'react-router-dom';
import { connectionNotice, type ConnectionState } from '../../collab/connectionState';
import { signInPathFor } from '../../lib/safeNextPath';

const TONE: Record<'quiet' | 'warn' | 'stop', string> = {
  quiet: 'border-paper-rule bg-paper-sunk',
  warn: 'border-low bg-[#fbf3e2]',
  stop: 'border-fail bg-[#fbefec]',
};

/** The state of the live connection in words, above the cells; nothing when all is well. */
export function ConnectionBanner({ state, readOnly }: { state: ConnectionState; readOnly: boolean }) {
  const location = useLocation();
  const notice = connectionNotice(state, readOnly);
  if (!notice) return null;
  return (
    <div
      role={notice.tone === 'quiet' ? 'status' : 'alert'}
      data-connection={state.kind}
      className={`mb-3 flex flex-wrap items-baseline gap-x-2 border-l-[3px] px-3 py-1.5 text-[0.875rem] ${TONE[notice.tone]}`}
    >
      <strong className="font-semibold">{notice.title}</strong>
      <span>{notice.detail}</span>
      {state.kind === 'signed-out' ? (
        <Link to={signInPathFor(location.pathname + location.search)} className="underline">
          Sign in
        </Link>
      ) : null}
    </div>
  );
}
