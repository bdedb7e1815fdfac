import '@/styles/workspace.css';

import { Button, Callout } from '@blueprintjs/core';
import { ChevronLeftIcon } from '@blueprintjs/icons';
import { Link, useNavigate, useParams } from 'react-router-dom';

import { NotFound } from '@/components/errors/not-found';
import { PageHeader } from '@/components/page-header';
import { PageLoader } from '@/components/page-loader';
import { ProjectDesigns } from '@/features/designs/components/project-designs';
import { useProject } from '@/features/projects/api/get-project';
import { ProjectActions } from '@/features/projects/components/project-actions';
import { ProjectSummary } from '@/features/projects/components/project-summary';
import { errorMessage, errorStatus } from '@/lib/api-errors';

/** One project: who and where it is for, and its designs. */
export function Component() {
  const projectId = Number(useParams().projectId);
  const valid = Number.isInteger(projectId) && projectId > 0;
  const project = useProject(valid ? projectId : 0);
  const navigate = useNavigate();

  if (!valid || errorStatus(project.error) === 404) return <NotFound />;
  if (project.isPending) return <PageLoader label="Loading the project" />;
  if (project.isError) {
    return (
      <Callout intent="danger" title="The project could not be loaded">
        <p>{errorMessage(project.error)}</p>
        <Button text="Try again" onClick={() => void project.refetch()} />
      </Callout>
    );
  }

  return (
    <>
      <Link to="/projects" className="tc-back-link">
        <ChevronLeftIcon /> Projects
      </Link>
      <PageHeader
        title={project.data.name}
        actions={<ProjectActions project={project.data} onDeleted={() => void navigate('/projects', { replace: true })} />}
      />
      <ProjectSummary project={project.data} />
      <ProjectDesigns projectId={project.data.id} />
    </>
  );
}
