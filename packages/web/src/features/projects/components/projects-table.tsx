import { HTMLTable, Tag } from '@blueprintjs/core';
import { designStateWords } from '@tacet/vibration';
import { Link } from 'react-router-dom';

import { formatDate } from '@/lib/dates';
import type { Project } from '@/types/design-api';

const NO_VALUE = '—';

/** The designs by state, in words: "1 in check · 2 released". */
const STATE_WORDS: [keyof Project['statusCounts'], string][] = (['draft', 'in_review', 'released', 'superseded'] as const).map((code) => [
  code,
  designStateWords(code),
]);

function DesignStates({ counts }: { counts: Project['statusCounts'] }) {
  const present = STATE_WORDS.filter(([key]) => counts[key] > 0);
  if (present.length === 0) return <span className="tc-muted">{NO_VALUE}</span>;
  return (
    <span className="tc-project-states">
      {present.map(([key, words]) => (
        <Tag key={key} minimal round className={`tc-status tc-status--${key}`}>
          {counts[key]} {words}
        </Tag>
      ))}
    </span>
  );
}

export function ProjectsTable({ projects }: { projects: readonly Project[] }) {
  return (
    <HTMLTable className="tc-table" striped interactive aria-label="Projects">
      <thead>
        <tr>
          <th scope="col">Name</th>
          <th scope="col">Site</th>
          <th scope="col">Client</th>
          <th scope="col" className="tc-number">
            Designs
          </th>
          <th scope="col">Status</th>
          <th scope="col">Owner</th>
          <th scope="col">Updated</th>
        </tr>
      </thead>
      <tbody>
        {projects.map((project) => (
          <tr key={project.id} className={project.archived ? 'tc-row-inactive' : undefined}>
            <td>
              <Link to={`/projects/${project.id}`}>{project.name}</Link>
              {project.archived ? (
                <Tag minimal className="tc-inline-tag">
                  Archived
                </Tag>
              ) : null}
            </td>
            <td>{project.site || NO_VALUE}</td>
            <td>{project.client || NO_VALUE}</td>
            <td className="tc-number">{project.designCount}</td>
            <td>
              <DesignStates counts={project.statusCounts} />
            </td>
            <td>{project.owner.name}</td>
            <td>{formatDate(project.updatedAt)}</td>
          </tr>
        ))}
      </tbody>
    </HTMLTable>
  );
}
