import type { ReactNode } from 'react';

import { useDocumentTitle } from '@/hooks/use-document-title';

export interface PageHeaderProps {
  title: string;
  description?: ReactNode;
  actions?: ReactNode;
}

/** The title block at the top of every page; also sets the browser tab title. */
export function PageHeader({ title, description, actions }: PageHeaderProps) {
  useDocumentTitle(title);
  return (
    <div className="tc-page-header">
      <div>
        <h1 className="tc-page-title">{title}</h1>
        {description ? <p className="tc-page-description">{description}</p> : null}
      </div>
      {actions ? <div className="tc-page-actions">{actions}</div> : null}
    </div>
  );
}
