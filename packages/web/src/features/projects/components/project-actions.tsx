import { Button, Dialog, DialogBody, DialogFooter, FormGroup, InputGroup } from '@blueprintjs/core';
import { ArchiveIcon, EditIcon, TrashIcon, UnarchiveIcon } from '@blueprintjs/icons';
import { useState, type FormEvent } from 'react';

import { ConfirmActionAlert } from '@/components/confirm-action-alert';
import { FormError } from '@/components/form/form-error';
import { errorMessage } from '@/lib/api-errors';
import { useUser } from '@/lib/auth';
import type { Project } from '@/types/design-api';

import { useDeleteProject } from '../api/delete-project';
import { useUpdateProject } from '../api/update-project';
import { PROJECT_NAME_MAX_LENGTH } from '../schemas/project-schema';

/** Who may rename, archive and delete a project: its owner (an engineer) or an admin. */
export function canManageProject(user: { id: number; role: string }, project: Project): boolean {
  return user.role === 'admin' || (user.role === 'engineer' && project.owner.id === user.id);
}

function RenameDialog({ project, onClose }: { project: Project; onClose: () => void }) {
  const update = useUpdateProject();
  const [name, setName] = useState(project.name);
  const [failure, setFailure] = useState<string | null>(null);
  const problem = !name.trim()
    ? 'Give the project a name'
    : name.trim().length > PROJECT_NAME_MAX_LENGTH
      ? `Keep the name to ${PROJECT_NAME_MAX_LENGTH} characters or fewer`
      : null;
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    if (problem) return;
    try {
      await update.mutateAsync({ projectId: project.id, name: name.trim() });
      onClose();
    } catch (error) {
      setFailure(errorMessage(error));
    }
  };
  return (
    <Dialog title="Rename the project" isOpen onClose={onClose} className="tc-dialog">
      <form onSubmit={(event) => void submit(event)} aria-label="Rename the project">
        <DialogBody>
          <FormGroup label="Name" labelFor="rename-project" intent={problem ? 'danger' : 'none'} helperText={problem ?? undefined}>
            <InputGroup id="rename-project" value={name} autoFocus onChange={(event) => setName(event.target.value)} />
          </FormGroup>
          <FormError message={failure} />
        </DialogBody>
        <DialogFooter
          actions={
            <>
              <Button text="Cancel" onClick={onClose} />
              <Button type="submit" intent="primary" text="Rename" loading={update.isPending} disabled={problem !== null} />
            </>
          }
        />
      </form>
    </Dialog>
  );
}

/** Rename, archive or restore, and delete a project — for its owner and admins. */
export function ProjectActions({ project, onDeleted }: { project: Project; onDeleted: () => void }) {
  const user = useUser();
  const update = useUpdateProject();
  const remove = useDeleteProject();
  const [renaming, setRenaming] = useState(false);
  const [archiving, setArchiving] = useState(false);
  const [deleting, setDeleting] = useState(false);
  if (!canManageProject(user, project)) return null;
  const signedOff = project.statusCounts.released + project.statusCounts.superseded > 0;
  return (
    <div className="tc-project-actions">
      <Button icon={<EditIcon />} text="Rename" onClick={() => setRenaming(true)} />
      <Button
        icon={project.archived ? <UnarchiveIcon /> : <ArchiveIcon />}
        text={project.archived ? 'Restore' : 'Archive'}
        onClick={() => setArchiving(true)}
      />
      <Button
        icon={<TrashIcon />}
        intent="danger"
        text="Delete"
        disabled={signedOff}
        title={signedOff ? 'A project with a released design is kept for the record: archive it instead' : undefined}
        onClick={() => setDeleting(true)}
      />
      {renaming ? <RenameDialog project={project} onClose={() => setRenaming(false)} /> : null}
      <ConfirmActionAlert
        isOpen={archiving}
        icon={project.archived ? <UnarchiveIcon /> : <ArchiveIcon />}
        intent="primary"
        confirmButtonText={project.archived ? 'Restore the project' : 'Archive the project'}
        pending={update.isPending}
        onConfirm={() => update.mutateAsync({ projectId: project.id, archived: !project.archived })}
        onClose={() => setArchiving(false)}
      >
        {project.archived ? (
          <p>Restore {project.name}? It shows in the project list again and takes new designs.</p>
        ) : (
          <p>
            Archive {project.name}? It stays readable, leaves the project list (unless archived projects are shown) and takes no new
            designs.
          </p>
        )}
      </ConfirmActionAlert>
      <ConfirmActionAlert
        isOpen={deleting}
        icon={<TrashIcon />}
        confirmButtonText="Delete the project"
        pending={remove.isPending}
        onConfirm={async () => {
          await remove.mutateAsync(project.id);
          onDeleted();
        }}
        onClose={() => setDeleting(false)}
      >
        <p>
          Delete {project.name} and its {project.designCount === 1 ? 'design' : `${project.designCount} designs`}? This cannot be undone.
        </p>
      </ConfirmActionAlert>
    </div>
  );
}
