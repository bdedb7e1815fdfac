import { Button, Callout, NonIdealState, Switch } from '@blueprintjs/core';
import { FolderNewIcon, PlusIcon } from '@blueprintjs/icons';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';

import { PageHeader } from '@/components/page-header';
import { PageLoader } from '@/components/page-loader';
import { errorMessage } from '@/lib/api-errors';
import { useUser } from '@/lib/auth';
import { canDesign } from '@/lib/authorization';
import type { Project } from '@/types/design-api';

import { useProjects } from '../api/get-projects';
import { CreateProjectDialog } from './create-project-dialog';
import { ProjectsTable } from './projects-table';

function summary(projects: readonly Project[]): string {
  const designs = projects.reduce((sum, project) => sum + project.designCount, 0);
  const p = projects.length === 1 ? '1 project' : `${projects.length} projects`;
  const d = designs === 1 ? '1 design' : `${designs} designs`;
  return `${p}, ${d}`;
}

/** The Projects page: every project with its designs count, and the way to start a new one. */
export function ProjectsList() {
  const user = useUser();
  const projects = useProjects();
  const navigate = useNavigate();
  const [creating, setCreating] = useState(false);
  const [showArchived, setShowArchived] = useState(false);
  const mayCreate = canDesign(user.role);
  const archivedCount = projects.data?.filter((project) => project.archived).length ?? 0;
  const shown = projects.data?.filter((project) => showArchived || !project.archived);

  return (
    <>
      <PageHeader
        title="Projects"
        description="Each project holds the designs for one site or job: the machines, their mounts, revisions and their check and release."
        actions={
          mayCreate ? <Button intent="primary" icon={<PlusIcon />} text="New project" onClick={() => setCreating(true)} /> : undefined
        }
      />
      <div className="tc-panel">
        {projects.isPending ? <PageLoader label="Loading projects" /> : null}
        {projects.isError ? (
          <Callout intent="danger" title="The projects could not be loaded">
            <p>{errorMessage(projects.error)}</p>
            <Button text="Try again" onClick={() => void projects.refetch()} />
          </Callout>
        ) : null}
        {projects.data && projects.data.length === 0 ? (
          <NonIdealState
            icon={<FolderNewIcon size={40} />}
            title="No projects yet"
            description={mayCreate ? 'Start one with “New project”.' : 'Projects appear here once an engineer starts one.'}
          />
        ) : null}
        {projects.data && projects.data.length > 0 && shown ? (
          <>
            <div className="tc-table-toolbar">
              <p className="tc-muted tc-table-summary">{summary(shown)}</p>
              <Switch
                checked={showArchived}
                label={`Show archived projects (${archivedCount})`}
                onChange={(event) => setShowArchived(event.currentTarget.checked)}
              />
            </div>
            {shown.length > 0 ? (
              <ProjectsTable projects={shown} />
            ) : (
              <p className="tc-muted">Every project is archived. Turn on “Show archived projects” to see them.</p>
            )}
          </>
        ) : null}
      </div>
      {mayCreate ? (
        <CreateProjectDialog
          isOpen={creating}
          onClose={() => setCreating(false)}
          onCreated={(project) => navigate(`/projects/${project.id}`)}
        />
      ) : null}
    </>
  );
}
