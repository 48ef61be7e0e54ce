import { Link } from 'react-router-dom';

/** The product name with its mark: a small stack of sheets, the top one ruled. */
export function Wordmark({ to = '/' }: { to?: string }) {
  return (
    <Link
      to={to}
      className="inline-flex items-center gap-2 rounded-sm text-frame-text no-underline"
    >
      <svg width="20" height="20" viewBox="0 0 32 32" aria-hidden="true" focusable="false">
        <rect x="10" y="5" width="15" height="19" rx="1" fill="#cfc8b8" />
        <rect x="6" y="8" width="15" height="19" rx="1" fill="#fbf8f1" />
        <path d="M9 14h9M9 18h9M9 22h5" stroke="#2a2c2e" strokeWidth="1.6" />
      </svg>
      <span className="text-[1.0625rem] font-semibold tracking-tight">Sheaf</span>
    </Link>
  );
}
