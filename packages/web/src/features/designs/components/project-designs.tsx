import { Button, Callout, HTMLTable, NonIdealState } from '@blueprintjs/core';
import { DocumentIcon, PlusIcon } from '@blueprintjs/icons';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';

import { PageLoader } from '@/components/page-loader';
import { errorMessage } from '@/lib/api-errors';
import { useUser } from '@/lib/auth';
import { canDesign } from '@/lib/authorization';
import { formatDate } from '@/lib/dates';

import { useProjectDesigns } from '../api/get-project-designs';
import { CreateDesignDialog } from './create-design-dialog';
import { DesignStatusTag } from './design-status-tag';

/** A project's designs with their revision and state, and the way to start a new one. */
export function ProjectDesigns({ projectId }: { projectId: number }) {
  const user = useUser();
  const designs = useProjectDesigns(projectId);
  const navigate = useNavigate();
  const [creating, setCreating] = useState(false);
  const mayCreate = canDesign(user.role);

  return (
    <section className="tc-section" aria-labelledby="tc-project-designs">
      <div className="tc-section-heading">
        <h2 id="tc-project-designs" className="tc-section-title">
          Designs
        </h2>
        {mayCreate ? <Button icon={<PlusIcon />} intent="primary" text="New design" onClick={() => setCreating(true)} /> : null}
      </div>
      <div className="tc-panel">
        {designs.isPending ? <PageLoader label="Loading designs" /> : null}
        {designs.isError ? (
          <Callout intent="danger" title="The designs could not be loaded">
            <p>{errorMessage(designs.error)}</p>
            <Button text="Try again" onClick={() => void designs.refetch()} />
          </Callout>
        ) : null}
        {designs.data && designs.data.length === 0 ? (
          <NonIdealState
            icon={<DocumentIcon size={40} />}
            title={user.role === 'purchaser' ? 'No released designs yet' : 'No designs yet'}
            description={mayCreate ? 'Start one with “New design”.' : undefined}
          />
        ) : null}
        {designs.data && designs.data.length > 0 ? (
          <HTMLTable className="tc-table" striped interactive aria-label="Designs">
            <thead>
              <tr>
                <th scope="col">Name</th>
                <th scope="col" className="tc-number">
                  Revision
                </th>
                <th scope="col">Status</th>
                <th scope="col">Author</th>
                <th scope="col">Updated</th>
              </tr>
            </thead>
            <tbody>
              {designs.data.map((design) => (
                <tr key={design.id}>
                  <td>
                    <Link to={`/designs/${design.id}`}>{design.name}</Link>
                  </td>
                  <td className="tc-number">{design.revision}</td>
                  <td>
                    <DesignStatusTag status={design.status} />
                  </td>
                  <td>{design.author.name}</td>
                  <td>{formatDate(design.updatedAt)}</td>
                </tr>
              ))}
            </tbody>
          </HTMLTable>
        ) : null}
      </div>
      {mayCreate ? (
        <CreateDesignDialog
          projectId={projectId}
          isOpen={creating}
          onClose={() => setCreating(false)}
          onCreated={(design) => navigate(`/designs/${design.id}`)}
        />
      ) : null}
    </section>
  );
}
