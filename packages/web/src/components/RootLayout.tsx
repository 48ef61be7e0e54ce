import { Outlet, ScrollRestoration } from 'react-router-dom';
import { CautionFooter } from './CautionFooter';

/** Every page: its content, then the caution footer. */
export function RootLayout() {
  return (
    <div className="flex min-h-screen flex-col bg-frame print:block print:min-h-0 print:bg-white">
      <a
        href="#main"
        className="sr-only z-50 rounded-[3px] bg-paper px-3 py-2 text-ink focus:not-sr-only focus:absolute focus:top-2 focus:left-2"
      >
        Skip to content
      </a>
      {/* On paper the frame is plain blocks: a flex column that runs over several pages loses what follows it. */}
      <div className="flex flex-1 flex-col print:block">
        <Outlet />
      </div>
      <CautionFooter />
      <ScrollRestoration />
    </div>
  );
}
