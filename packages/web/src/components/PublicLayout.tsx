import { Outlet } from 'react-router-dom';
import { Wordmark } from './Wordmark';

/** The frame for pages used while signed out: sign-in, sign-up, password reset, invitations. */
export function PublicLayout() {
  return (
    <div className="flex flex-1 flex-col items-center px-4 py-10">
      <header className="mb-6">
        <Wordmark to="/signin" />
      </header>
      <main id="main" className="paper w-full max-w-[26rem] rounded-[3px] px-6 py-6">
        <Outlet />
      </main>
    </div>
  );
}
