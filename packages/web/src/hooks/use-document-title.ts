import { useEffect } from 'react';

export const PRODUCT_NAME = 'Tacet';

/** Sets the browser tab title to "<page> · Tacet" while the page is shown. */
export function useDocumentTitle(page?: string): void {
  useEffect(() => {
    document.title = page ? `${page} · ${PRODUCT_NAME}` : PRODUCT_NAME;
  }, [page]);
}
