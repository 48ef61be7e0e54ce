import { isRouteErrorResponse, Link, useLocation, useRouteError } from 'react-router-dom';
import { isApiError } from '../api/ApiError';
import { signInPathFor } from '../lib/safeNextPath';
import { CautionFooter } from './CautionFooter';
import { Paper } from './Paper';
import { VerdictShape } from './VerdictShape';

interface Explained {
  heading: string;
  detail: string;
  status?: string;
}

/** What went wrong, in the words of the server when it gave any. */
function explain(error: unknown): Explained {
  if (isApiError(error)) {
    const status = error.status > 0 ? `${error.status} ${error.code}` : error.code;
    switch (error.status) {
      case 0:
        return { heading: 'The Sheaf server could not be reached', detail: error.message, status };
      case 401:
        return { heading: 'You are signed out', detail: error.message, status };
      case 403:
        return { heading: 'You do not have access to this', detail: error.message, status };
      case 404:
        return { heading: 'Not found', detail: error.message, status };
      case 410:
        return { heading: 'This link has expired', detail: error.message, status };
      default:
        return {
          heading: 'The server could not complete the request',
          detail: error.message,
          status,
        };
    }
  }
  if (isRouteErrorResponse(error)) {
    return {
      heading: error.status === 404 ? 'Not found' : 'The page could not be loaded',
      detail: typeof error.data === 'string' && error.data ? error.data : error.statusText,
      status: String(error.status),
    };
  }
  if (error instanceof Error) {
    return { heading: 'Something went wrong on this page', detail: error.message };
  }
  return {
    heading: 'Something went wrong on this page',
    detail: 'No further detail is available.',
  };
}

/** What failed and what to do next; the boundaries below place it on the page. */
function ErrorReport() {
  const error = useRouteError();
  const location = useLocation();
  const { heading, detail, status } = explain(error);
  const signedOut = isApiError(error) && error.status === 401;
  return (
    <>
      <div role="alert" className="flex gap-2">
        <VerdictShape verdict="fail" className="mt-1.5 shrink-0 text-fail" />
        <div>
          <h1 className="text-[1.25rem]">{heading}</h1>
          <p className="mt-1 max-w-prose">{detail}</p>
          {status ? (
            <p className="mt-1 font-mono text-[0.8125rem] text-ink-muted">
              Server answer: {status}
            </p>
          ) : null}
        </div>
      </div>
      <p className="mt-4 flex gap-2">
        {signedOut ? (
          <Link className="btn btn-primary" to={signInPathFor(location.pathname + location.search)}>
            Sign in
          </Link>
        ) : (
          <button type="button" className="btn" onClick={() => window.location.reload()}>
            Try again
          </button>
        )}
        <Link className="btn" to="/sheets">
          Go to sheets
        </Link>
      </p>
    </>
  );
}

/** A page inside the shell failed: the navigation stays, the page's place says what failed. */
export function RouteErrorBoundary() {
  return (
    <Paper>
      <ErrorReport />
    </Paper>
  );
}

/** A page inside the signed-out frame failed; that frame already is a sheet of paper. */
export function PublicRouteErrorBoundary() {
  return <ErrorReport />;
}

/** A layout (the shell, the signed-out frame) failed, e.g. the server is unreachable at start. */
export function FrameErrorBoundary() {
  return (
    <main id="main" className="mx-auto w-full max-w-2xl flex-1 p-6">
      <RouteErrorBoundary />
    </main>
  );
}

/** The outermost boundary: used when even the root frame failed, so it brings the footer itself. */
export function RootErrorBoundary() {
  return (
    <div className="flex min-h-screen flex-col bg-frame">
      <FrameErrorBoundary />
      <CautionFooter />
    </div>
  );
}
