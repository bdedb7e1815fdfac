import { Spinner } from '@blueprintjs/core';

/** Shown while a page's code or the signed-in user is loading. */
export function PageLoader({ label = 'Loading' }: { label?: string }) {
  return (
    <div className="tc-page-loader" role="status" aria-live="polite">
      <Spinner size={32} aria-label={label} />
      <span className="tc-visually-hidden">{label}…</span>
    </div>
  );
}
