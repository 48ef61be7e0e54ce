import { useEffect } from 'react';

/** Sets the browser tab's title to "<page> · Sheaf" while the page is shown. */
export function useDocumentTitle(pageTitle: string | null | undefined): void {
  useEffect(() => {
    document.title = pageTitle ? `${pageTitle} · Sheaf` : 'Sheaf';
  }, [pageTitle]);
}
