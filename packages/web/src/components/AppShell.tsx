import { Outlet } from 'react-router-dom';
import { useMe } from '../api/auth';
import { Loading } from './Loading';
import { SideNav } from './SideNav';
import { TopBar } from './TopBar';

/**
 * The signed-in frame: top bar (product, organization, user), navigation on the left, the page on
 * paper in the middle. The route's loader has already made sure the user is signed in.
 */
export function AppShell() {
  const me = useMe();
  if (!me.data) return <Loading what="your account" />;
  return (
    <div className="flex flex-1 flex-col print:block">
      <TopBar user={me.data.user} />
      <div className="flex flex-1 flex-col md:flex-row print:block">
        <SideNav />
        <main
          id="main"
          tabIndex={-1}
          className="min-w-0 flex-1 px-3 py-3 outline-none sm:px-5 sm:py-4 print:p-0"
        >
          <Outlet />
        </main>
      </div>
    </div>
  );
}
