import { Button, ButtonGroup } from '@blueprintjs/core';
import { ChevronBackwardIcon, ChevronForwardIcon, ChevronLeftIcon, ChevronRightIcon } from '@blueprintjs/icons';

import { formatNumber } from '@/lib/units';

export interface CatalogPagerProps {
  page: number;
  pageSize: number;
  total: number;
  onPage: (page: number) => void;
  /** Distinguishes the two pagers of a page for assistive technology. */
  label?: string;
}

export function pageCount(total: number, pageSize: number): number {
  return Math.max(1, Math.ceil(total / pageSize));
}

/** "Mounts 101–200 of 12,345" and buttons to the first, previous, next and last page. */
export function CatalogPager({ page, pageSize, total, onPage, label = 'Pages' }: CatalogPagerProps) {
  const pages = pageCount(total, pageSize);
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <nav className="tc-catalog-pager" aria-label={label}>
      <span className="tc-muted">
        Page {formatNumber(page, 0)} of {formatNumber(pages, 0)}
        {total > 0 ? ` · rows ${formatNumber(first, 0)}–${formatNumber(last, 0)}` : ''}
      </span>
      <ButtonGroup variant="outlined">
        <Button icon={<ChevronBackwardIcon />} aria-label="First page" disabled={page <= 1} onClick={() => onPage(1)} />
        <Button icon={<ChevronLeftIcon />} aria-label="Previous page" disabled={page <= 1} onClick={() => onPage(page - 1)} />
        <Button icon={<ChevronRightIcon />} aria-label="Next page" disabled={page >= pages} onClick={() => onPage(page + 1)} />
        <Button icon={<ChevronForwardIcon />} aria-label="Last page" disabled={page >= pages} onClick={() => onPage(pages)} />
      </ButtonGroup>
    </nav>
  );
}
