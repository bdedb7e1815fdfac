import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';

import { Brand } from '@/components/layout/brand';
import { useDocumentTitle } from '@/hooks/use-document-title';

/** The frame of the sign-in page and the pages around it (forgot password, choose a new one). */
export function PasswordPage({
  title,
  lead,
  children,
  footer = (
    <p className="tc-sign-in-note">
      <Link to="/sign-in">Back to sign in</Link>
    </p>
  ),
}: {
  title: string;
  lead: string;
  children: ReactNode;
  footer?: ReactNode;
}) {
  useDocumentTitle(title);
  return (
    <div className="tc-sign-in">
      <main className="tc-sign-in-card">
        <div className="tc-sign-in-brand">
          <Brand />
        </div>
        <h1 className="tc-sign-in-title">{title}</h1>
        <p className="tc-sign-in-lead">{lead}</p>
        {children}
        {footer}
      </main>
    </div>
  );
}
