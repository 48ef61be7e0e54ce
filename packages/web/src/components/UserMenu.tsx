import { useEffect, useId, useRef, useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { describeError } from '../api/ApiError';
import { useSignOut } from '../api/auth';
import type { User } from '../api/types';

/** The signed-in person, with their profile and sign-out behind a disclosure button. */
export function UserMenu({ user }: { user: User }) {
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  const buttonRef = useRef<HTMLButtonElement>(null);
  const signOut = useSignOut();
  const navigate = useNavigate();

  useEffect(() => {
    if (!open) return;
    function onPointerDown(event: PointerEvent) {
      if (rootRef.current && !rootRef.current.contains(event.target as Node)) setOpen(false);
    }
    function onKeyDown(event: KeyboardEvent) {
      if (event.key === 'Escape') {
        setOpen(false);
        buttonRef.current?.focus();
      }
    }
    document.addEventListener('pointerdown', onPointerDown);
    document.addEventListener('keydown', onKeyDown);
    return () => {
      document.removeEventListener('pointerdown', onPointerDown);
      document.removeEventListener('keydown', onKeyDown);
    };
  }, [open]);

  function onSignOut() {
    signOut.mutate(undefined, { onSuccess: () => navigate('/signin') });
  }

  return (
    <div ref={rootRef} className="relative">
      <button
        ref={buttonRef}
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpen((v) => !v)}
        className="flex items-center gap-2 rounded-[3px] px-2 py-1 text-frame-text hover:bg-frame-raised"
      >
        <span
          aria-hidden="true"
          className="grid h-6 w-6 place-items-center rounded-full bg-frame-line text-[0.75rem] font-semibold"
        >
          {initials(user.name || user.email)}
        </span>
        <span className="hidden sm:inline">{user.name || user.email}</span>
        <svg width="10" height="10" viewBox="0 0 10 10" aria-hidden="true" focusable="false">
          <path d="M1.5 3.5 5 7l3.5-3.5" fill="none" stroke="currentColor" strokeWidth="1.4" />
        </svg>
      </button>
      {open ? (
        <div id={panelId} className="paper absolute right-0 z-20 mt-1 w-64 rounded-[3px] py-1">
          <p className="border-b border-paper-line px-3 py-2 text-[0.8125rem] text-ink-muted">
            Signed in as <span className="font-mono text-ink">{user.email}</span>
          </p>
          <ul>
            <li>
              <Link
                to="/profile"
                onClick={() => setOpen(false)}
                className="block px-3 py-1.5 hover:bg-paper-sunk"
              >
                Profile
              </Link>
            </li>
            <li>
              <button
                type="button"
                onClick={onSignOut}
                disabled={signOut.isPending}
                className="block w-full px-3 py-1.5 text-left hover:bg-paper-sunk"
              >
                {signOut.isPending ? 'Signing out…' : 'Sign out'}
              </button>
            </li>
          </ul>
          {signOut.isError ? (
            <p role="alert" className="px-3 py-1.5 text-[0.8125rem] text-fail">
              Sign-out failed: {describeError(signOut.error)}
            </p>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}

function initials(name: string): string {
  const parts = name
    .trim()
    .split(/[\s@.]+/)
    .filter(Boolean);
  return ((parts[0]?.[0] ?? '?') + (parts[1]?.[0] ?? '')).toUpperCase();
}
