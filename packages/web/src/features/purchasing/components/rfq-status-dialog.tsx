import { Button, Dialog, DialogBody, DialogFooter } from '@blueprintjs/core';
import { Form, Formik } from 'formik';
import { useState } from 'react';

import { FormError } from '@/components/form/form-error';
import { SelectField } from '@/components/form/select-field';
import { TextAreaField } from '@/components/form/text-area-field';
import { TextField } from '@/components/form/text-field';
import { errorMessage } from '@/lib/api-errors';

import { useUpdateRfq } from '../api/update-rfq';
import { nextStatuses, rfqStatusSchema, type RfqStatusValues } from '../schemas/rfq-status-schema';
import type { RecordedRfqStatus, Rfq } from '../types';
import { RFQ_STATUS_LABELS } from './rfq-status-tag';

export interface RfqStatusDialogProps {
  rfq: Rfq;
  currency: string;
  onClose: () => void;
}

/** Records that the supplier quoted (with the price), that it was ordered, or that it arrived. */
export function RfqStatusDialog({ rfq, currency, onClose }: RfqStatusDialogProps) {
  const update = useUpdateRfq();
  const [failure, setFailure] = useState<string | null>(null);
  const options = nextStatuses(rfq.status);
  const initialValues: RfqStatusValues = { status: options[0] ?? '', quotedPrice: '', note: '' };

  const submit = async (values: RfqStatusValues) => {
    setFailure(null);
    const note = values.note.trim();
    try {
      await update.mutateAsync({
        rfqId: rfq.id,
        designId: rfq.designId,
        status: values.status as RecordedRfqStatus,
        ...(values.status === 'quoted' ? { quotedPrice: Number(values.quotedPrice), quotedAt: new Date().toISOString() } : {}),
        ...(note ? { note } : {}),
      });
      onClose();
    } catch (error) {
      setFailure(errorMessage(error));
    }
  };

  return (
    <Dialog title={`Record progress — ${rfq.supplier.name}`} isOpen onClose={onClose} className="tc-dialog">
      <Formik<RfqStatusValues> initialValues={initialValues} validationSchema={rfqStatusSchema(rfq.status)} onSubmit={submit}>
        {({ values, isSubmitting }) => (
          <Form noValidate aria-label="Record progress">
            <DialogBody>
              <SelectField
                name="status"
                id={`rfq-${rfq.id}-status`}
                label="New state"
                options={options.map((status) => ({ value: status, label: RFQ_STATUS_LABELS[status] }))}
                helperText="A request only moves forward: requested, quoted, ordered, received."
              />
              {values.status === 'quoted' ? (
                <TextField
                  name="quotedPrice"
                  id={`rfq-${rfq.id}-price`}
                  label={`Quoted price for these lines (${currency})`}
                  autoComplete="off"
                />
              ) : null}
              <TextAreaField name="note" id={`rfq-${rfq.id}-note`} label="Note (optional)" rows={2} />
              <FormError message={failure} />
            </DialogBody>
            <DialogFooter
              actions={
                <>
                  <Button text="Cancel" onClick={onClose} disabled={isSubmitting} />
                  <Button type="submit" intent="primary" text="Record" loading={isSubmitting} />
                </>
              }
            />
          </Form>
        )}
      </Formik>
    </Dialog>
  );
}
