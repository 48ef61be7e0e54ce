import { Link, useLocation } from 'react-router-dom';
import { Paper } from '../components/Paper';
import { Wordmark } from '../components/Wordmark';
import { useDocumentTitle } from '../hooks/useDocumentTitle';

/** Any address the app does not know. */
export function NotFoundPage() {
  useDocumentTitle('Page not found');
  const { pathname } = useLocation();
  return (
    <div className="flex flex-1 flex-col items-center px-4 py-10">
      <header className="mb-6">
        <Wordmark to="/sheets" />
      </header>
      <main id="main" className="w-full max-w-lg">
        <Paper>
          <h1 className="text-[1.25rem]">Page not found</h1>
          <p className="mt-2">
            There is no page at <span className="font-mono break-all">{pathname}</span>.
          </p>
          <p className="mt-1 text-ink-muted">
            The link may be mistyped, or the page may have moved.
          </p>
          <p className="mt-4 flex gap-2">
            <Link to="/sheets" className="btn btn-primary">
              Go to sheets
            </Link>
            <Link to="/signin" className="btn">
              Sign in
            </Link>
          </p>
        </Paper>
      </main>
    </div>
  );
}
