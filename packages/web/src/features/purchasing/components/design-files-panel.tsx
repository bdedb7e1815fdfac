import { Callout } from '@blueprintjs/core';

import type { SessionUser } from '@/lib/auth';
import { useUser } from '@/lib/auth';
import type { Design } from '@/types/design-api';

import type { DesignDocument } from '../api/download-design-documents';
import { DesignDocuments } from './design-documents';
import { documentBaseName } from './format';

import './purchasing.css';

/**
 * Which files of a design a person may have (README "Who sees what"; the server has the final
 * say): the BOM of a released or superseded design for purchasers, engineers and admins, of an
 * unreleased one for its author, an admin, or an engineer while it is in check; the report for
 * everyone who sees a released design, of an unreleased one for engineers and admins.
 */
export function designFiles(design: Pick<Design, 'status' | 'author' | 'bom'>, user: Pick<SessionUser, 'id' | 'role'>): DesignDocument[] {
  const released = design.status === 'released' || design.status === 'superseded';
  const designer = user.role === 'engineer' || user.role === 'admin';
  const bom =
    design.bom.length > 0 &&
    (released
      ? designer || user.role === 'purchaser'
      : user.role === 'admin' || design.author.id === user.id || (design.status === 'in_review' && user.role === 'engineer'));
  const report = released || designer;
  return [...(bom ? (['bom-csv', 'bom-xlsx'] as const) : []), ...(report ? (['report-pdf'] as const) : [])];
}

/** "Report and bill of materials" on the design page, marked as drafts while the design is not released. */
export function DesignFilesPanel({ design }: { design: Design }) {
  const user = useUser();
  const files = designFiles(design, user);
  if (files.length === 0) return null;
  const released = design.status === 'released' || design.status === 'superseded';
  return (
    <section className="tc-panel tc-design-files" aria-labelledby="design-files-title">
      <h2 id="design-files-title" className="tc-purchase-title">
        Report and bill of materials
      </h2>
      {!released ? (
        <Callout intent="warning" className="tc-note" title="Draft">
          This revision is not released: the files are marked DRAFT and are not for purchasing or construction.
        </Callout>
      ) : null}
      <DesignDocuments designId={design.id} baseName={documentBaseName(design.name, design.revision)} documents={files} />
    </section>
  );
}
