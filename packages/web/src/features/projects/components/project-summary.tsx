import { Tag } from '@blueprintjs/core';

import { formatDate } from '@/lib/dates';
import type { Project } from '@/types/design-api';

const NO_VALUE = '—';

/** Who and where a project is for, and its description. */
export function ProjectSummary({ project }: { project: Project }) {
  return (
    <section className="tc-panel tc-project-summary" aria-label="About this project">
      <dl className="tc-facts">
        <dt>Site</dt>
        <dd>{project.site || NO_VALUE}</dd>
        <dt>Client</dt>
        <dd>{project.client || NO_VALUE}</dd>
        <dt>Owner</dt>
        <dd>{project.owner.name}</dd>
        <dt>Started</dt>
        <dd>{formatDate(project.createdAt)}</dd>
        <dt>Updated</dt>
        <dd>{formatDate(project.updatedAt)}</dd>
        {project.archived ? (
          <>
            <dt>State</dt>
            <dd>
              <Tag minimal>Archived</Tag>
            </dd>
          </>
        ) : null}
      </dl>
      {project.description ? (
        <p className="tc-project-description">{project.description}</p>
      ) : (
        <p className="tc-muted tc-project-description">No description.</p>
      )}
    </section>
  );
}
