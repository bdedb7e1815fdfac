import { Button, Dialog, DialogBody, DialogFooter } from '@blueprintjs/core';
import { Form, Formik, type FormikHelpers } from 'formik';
import { useState } from 'react';

import { FormError } from '@/components/form/form-error';
import { TextField } from '@/components/form/text-field';
import { formFailure } from '@/lib/api-errors';
import type { Design } from '@/types/design-api';

import { useCreateDesign } from '../api/create-design';
import { createDesignSchema, type CreateDesignValues } from '../schemas/design-name-schema';

export interface CreateDesignDialogProps {
  projectId: number;
  isOpen: boolean;
  onClose: () => void;
  onCreated?: (design: Design) => void;
}

export function CreateDesignDialog({ projectId, isOpen, onClose, onCreated }: CreateDesignDialogProps) {
  const createDesign = useCreateDesign();
  const [failure, setFailure] = useState<string | null>(null);

  const close = () => {
    setFailure(null);
    onClose();
  };

  const submit = async (values: CreateDesignValues, helpers: FormikHelpers<CreateDesignValues>) => {
    setFailure(null);
    try {
      const design = await createDesign.mutateAsync({ projectId, name: values.name.trim() });
      helpers.resetForm();
      close();
      onCreated?.(design);
    } catch (error) {
      const { fields, general } = formFailure(error, ['name']);
      helpers.setErrors(fields);
      setFailure(general);
    }
  };

  return (
    <Dialog title="New design" isOpen={isOpen} onClose={close} className="tc-dialog">
      <Formik<CreateDesignValues> initialValues={{ name: '' }} validationSchema={createDesignSchema} onSubmit={submit}>
        {({ isSubmitting }) => (
          <Form noValidate aria-label="New design">
            <DialogBody>
              <TextField
                name="name"
                id="new-design-name"
                label="Name"
                autoComplete="off"
                autoFocus
                helperText="The design starts as a draft, revision 1, with example input to replace."
              />
              <FormError message={failure} />
            </DialogBody>
            <DialogFooter
              actions={
                <>
                  <Button text="Cancel" onClick={close} disabled={isSubmitting} />
                  <Button type="submit" intent="primary" text="Create and open" loading={isSubmitting} />
                </>
              }
            />
          </Form>
        )}
      </Formik>
    </Dialog>
  );
}
