import { Button, Dialog, DialogBody, DialogFooter, FormGroup, Switch, TextArea } from '@blueprintjs/core';
import { Form, Formik, useField, type FormikHelpers } from 'formik';
import { useMemo, useState } from 'react';

import { FormError } from '@/components/form/form-error';
import { TextField } from '@/components/form/text-field';
import { errorStatus, formFailure } from '@/lib/api-errors';

import { useCreateSupplier } from '../api/create-supplier';
import { useUpdateSupplier } from '../api/update-supplier';
import { supplierSchema, type SupplierFormValues } from '../schemas/supplier-schema';
import type { CreateSupplierInput, Supplier, UpdateSupplierInput } from '../types';

const EMPTY: SupplierFormValues = { name: '', contactEmail: '', phone: '', notes: '', active: true };

function NotesField() {
  const [field, meta] = useField<string>('notes');
  const error = meta.touched && meta.error ? meta.error : undefined;
  return (
    <FormGroup
      label="Notes"
      labelFor="supplier-notes"
      intent={error ? 'danger' : 'none'}
      helperText={error ?? 'Optional: terms, regions served, whom to ask'}
    >
      <TextArea {...field} id="supplier-notes" fill rows={3} value={field.value ?? ''} intent={error ? 'danger' : 'none'} />
    </FormGroup>
  );
}

function ActiveField() {
  const [field, , helpers] = useField<boolean>('active');
  return (
    <Switch
      id="supplier-active"
      name="active"
      label="Active (offered in selections and filters)"
      checked={Boolean(field.value)}
      onChange={(event) => void helpers.setValue(event.currentTarget.checked)}
    />
  );
}

const blankToNull = (value: string): string | null => (value.trim() === '' ? null : value.trim());

export interface SupplierFormDialogProps {
  isOpen: boolean;
  /** The supplier to edit; absent: a new one. */
  supplier?: Supplier | null;
  onClose: () => void;
}

/** Add a supplier or change one (catalog managers, admins). */
export function SupplierFormDialog({ isOpen, supplier, onClose }: SupplierFormDialogProps) {
  const createSupplier = useCreateSupplier();
  const updateSupplier = useUpdateSupplier();
  const [failure, setFailure] = useState<string | null>(null);
  const initialValues = useMemo<SupplierFormValues>(
    () =>
      supplier
        ? {
            name: supplier.name,
            contactEmail: supplier.contactEmail ?? '',
            phone: supplier.phone ?? '',
            notes: supplier.notes ?? '',
            active: supplier.active,
          }
        : EMPTY,
    [supplier],
  );

  const close = () => {
    setFailure(null);
    onClose();
  };

  const submit = async (values: SupplierFormValues, helpers: FormikHelpers<SupplierFormValues>) => {
    setFailure(null);
    try {
      if (supplier) {
        const changes: UpdateSupplierInput = {};
        if (values.name.trim() !== initialValues.name) changes.name = values.name.trim();
        if (values.contactEmail.trim() !== initialValues.contactEmail) changes.contactEmail = blankToNull(values.contactEmail);
        if (values.phone.trim() !== initialValues.phone) changes.phone = blankToNull(values.phone);
        if (values.notes.trim() !== initialValues.notes.trim()) changes.notes = blankToNull(values.notes);
        if (values.active !== initialValues.active) changes.active = values.active;
        if (Object.keys(changes).length > 0) await updateSupplier.mutateAsync({ id: supplier.id, changes });
      } else {
        const input: CreateSupplierInput = { name: values.name.trim() };
        if (values.contactEmail.trim()) input.contactEmail = values.contactEmail.trim();
        if (values.phone.trim()) input.phone = values.phone.trim();
        if (values.notes.trim()) input.notes = values.notes.trim();
        await createSupplier.mutateAsync(input);
      }
      close();
    } catch (error) {
      const { fields, general } = formFailure(error, ['name', 'contactEmail', 'phone', 'notes']);
      helpers.setErrors(fields);
      setFailure(
        errorStatus(error) === 409
          ? 'A supplier with this name already exists (names are compared without regard to case or spacing).'
          : general,
      );
    }
  };

  const title = supplier ? `Edit ${supplier.name}` : 'Add a supplier';
  return (
    <Dialog title={title} isOpen={isOpen} onClose={close} className="tc-dialog">
      <Formik<SupplierFormValues> initialValues={initialValues} validationSchema={supplierSchema} onSubmit={submit} enableReinitialize>
        {({ isSubmitting }) => (
          <Form noValidate aria-label={title}>
            <DialogBody>
              <TextField name="name" id="supplier-name" label="Name" autoComplete="off" autoFocus />
              <TextField
                name="contactEmail"
                id="supplier-email"
                label="Contact email"
                type="email"
                autoComplete="off"
                helperText="Requests for quotation go here"
              />
              <TextField name="phone" id="supplier-phone" label="Phone" autoComplete="off" />
              <NotesField />
              {supplier ? <ActiveField /> : null}
              <FormError message={failure} />
            </DialogBody>
            <DialogFooter
              actions={
                <>
                  <Button text="Cancel" onClick={close} disabled={isSubmitting} />
                  <Button type="submit" intent="primary" text={supplier ? 'Save changes' : 'Add supplier'} loading={isSubmitting} />
                </>
              }
            />
          </Form>
        )}
      </Formik>
    </Dialog>
  );
}
