import { Button, Dialog, DialogBody, DialogFooter } from '@blueprintjs/core';
import { Form, Formik, type FormikHelpers } from 'formik';
import { useState } from 'react';

import { FormError } from '@/components/form/form-error';
import { TextAreaField } from '@/components/form/text-area-field';
import { TextField } from '@/components/form/text-field';
import { formFailure } from '@/lib/api-errors';
import type { CreateProjectInput, Project } from '@/types/design-api';

import { useCreateProject } from '../api/create-project';
import { createProjectSchema, type CreateProjectValues } from '../schemas/project-schema';

const INITIAL_VALUES: CreateProjectValues = { name: '', site: '', client: '', description: '' };

export interface CreateProjectDialogProps {
  isOpen: boolean;
  onClose: () => void;
  onCreated?: (project: Project) => void;
}

/** Blank optional fields are left out rather than sent as empty text. */
export function toCreateProjectInput(values: CreateProjectValues): CreateProjectInput {
  const input: CreateProjectInput = { name: values.name.trim() };
  for (const key of ['site', 'client', 'description'] as const) {
    const text = values[key]?.trim();
    if (text) input[key] = text;
  }
  return input;
}

export function CreateProjectDialog({ isOpen, onClose, onCreated }: CreateProjectDialogProps) {
  const createProject = useCreateProject();
  const [failure, setFailure] = useState<string | null>(null);

  const close = () => {
    setFailure(null);
    onClose();
  };

  const submit = async (values: CreateProjectValues, helpers: FormikHelpers<CreateProjectValues>) => {
    setFailure(null);
    try {
      const project = await createProject.mutateAsync(toCreateProjectInput(values));
      helpers.resetForm();
      close();
      onCreated?.(project);
    } catch (error) {
      const { fields, general } = formFailure(error, ['name', 'site', 'client', 'description']);
      helpers.setErrors(fields);
      setFailure(general);
    }
  };

  return (
    <Dialog title="New project" isOpen={isOpen} onClose={close} className="tc-dialog">
      <Formik<CreateProjectValues> initialValues={INITIAL_VALUES} validationSchema={createProjectSchema} onSubmit={submit}>
        {({ isSubmitting }) => (
          <Form noValidate aria-label="New project">
            <DialogBody>
              <TextField name="name" id="new-project-name" label="Name" autoComplete="off" autoFocus />
              <TextField
                name="site"
                id="new-project-site"
                label="Site"
                autoComplete="off"
                helperText="Optional: where the machines will stand."
              />
              <TextField name="client" id="new-project-client" label="Client" autoComplete="off" helperText="Optional." />
              <TextAreaField name="description" id="new-project-description" label="Description" helperText="Optional." />
              <FormError message={failure} />
            </DialogBody>
            <DialogFooter
              actions={
                <>
                  <Button text="Cancel" onClick={close} disabled={isSubmitting} />
                  <Button type="submit" intent="primary" text="Create project" loading={isSubmitting} />
                </>
              }
            />
          </Form>
        )}
      </Formik>
    </Dialog>
  );
}
