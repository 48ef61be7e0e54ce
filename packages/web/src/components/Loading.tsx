/** A quiet placeholder while data is on its way; announced politely to screen readers. */
export function Loading({ what }: { what: string }) {
  return (
    <p role="status" aria-live="polite" className="py-6 text-ink-muted">
      Loading {what}…
    </p>
  );
}
