/** The product mark: a bar resting under a line — a silent measure — and the name. */
export function Brand() {
  return (
    <span className="tc-brand">
      <svg className="tc-brand-mark" viewBox="0 0 24 24" width="22" height="22" aria-hidden="true" focusable="false">
        <rect x="1" y="1" width="22" height="22" rx="6" />
        <rect x="5" y="7" width="14" height="1.6" rx="0.8" className="tc-brand-line" />
        <rect x="8" y="8.6" width="8" height="4.6" rx="0.8" className="tc-brand-line" />
        <rect x="5" y="16.4" width="14" height="1.6" rx="0.8" className="tc-brand-line tc-brand-line--soft" />
      </svg>
      <span className="tc-brand-name">Tacet</span>
    </span>
  );
}
