import { Button, Dialog, DialogBody, DialogFooter, HTMLTable } from '@blueprintjs/core';
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
import { formatPrice } from './format';
import { RFQ_STATUS_LABELS } from './rfq-status-tag';

export interface RfqStatusDialogProps {
  rfq: Rfq;
  currency: string;
  onClose: () => void;
}

/** Σ unit price × quantity of the lines typed so far (null until every line has a price). */
function quoteTotal(rfq: Rfq, values: RfqStatusValues): number | null {
  let total = 0;
  for (const line of rfq.lines) {
    const price = Number(values.lines.find((typed) => typed.lineId === line.id)?.unitPrice);
    if (!Number.isFinite(price) || price <= 0) return null;
    total += price * line.quantity;
  }
  return Math.round(total * 100) / 100;
}

/** Records the supplier's quote (line by line, with its reference and validity), the order, or the delivery. */
export function RfqStatusDialog({ rfq, currency, onClose }: RfqStatusDialogProps) {
  const update = useUpdateRfq();
  const [failure, setFailure] = useState<string | null>(null);
  const options = nextStatuses(rfq.status);
  const initialValues: RfqStatusValues = {
    status: options[0] ?? '',
    lines: rfq.lines.map((line) => ({ lineId: line.id, unitPrice: '', leadTimeDays: '' })),
    reference: '',
    validUntil: '',
    note: '',
  };

  const submit = async (values: RfqStatusValues) => {
    setFailure(null);
    const note = values.note.trim();
    const quote =
      values.status === 'quoted'
        ? {
            lines: values.lines.map((line) => ({
              lineId: line.lineId,
              unitPrice: Number(line.unitPrice),
              ...(line.leadTimeDays.trim() ? { leadTimeDays: Number(line.leadTimeDays) } : {}),
            })),
            ...(values.reference.trim() ? { reference: values.reference.trim() } : {}),
            ...(values.validUntil.trim() ? { validUntil: values.validUntil.trim() } : {}),
            quotedAt: new Date().toISOString(),
          }
        : {};
    try {
      await update.mutateAsync({
        rfqId: rfq.id,
        designId: rfq.designId,
        status: values.status as RecordedRfqStatus,
        ...quote,
        ...(note ? { note } : {}),
      });
      onClose();
    } catch (error) {
      setFailure(errorMessage(error));
    }
  };

  return (
    <Dialog title={`Record progress — ${rfq.supplier.name}`} isOpen onClose={onClose} className="tc-dialog tc-dialog--wide">
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
                <>
                  <HTMLTable compact className="tc-table tc-quote-lines" aria-label="Quoted lines">
                    <thead>
                      <tr>
                        <th scope="col">Part number</th>
                        <th scope="col" className="tc-number">
                          Quantity
                        </th>
                        <th scope="col">Unit price ({currency})</th>
                        <th scope="col">Lead time (days)</th>
                      </tr>
                    </thead>
                    <tbody>
                      {rfq.lines.map((line, index) => (
                        <tr key={line.id}>
                          <td className="tc-part-number">{line.partNumber}</td>
                          <td className="tc-number">{line.quantity}</td>
                          <td>
                            <TextField
                              name={`lines.${index}.unitPrice`}
                              id={`rfq-${rfq.id}-price-${line.id}`}
                              label={`Unit price of ${line.partNumber}`}
                              autoComplete="off"
                            />
                          </td>
                          <td>
                            <TextField
                              name={`lines.${index}.leadTimeDays`}
                              id={`rfq-${rfq.id}-lead-${line.id}`}
                              label={`Lead time of ${line.partNumber}`}
                              autoComplete="off"
                            />
                          </td>
                        </tr>
                      ))}
                    </tbody>
                  </HTMLTable>
                  <p className="tc-muted" data-testid="quote-total">
                    Total of the quote: {formatPrice(quoteTotal(rfq, values), currency)}
                  </p>
                  <TextField name="reference" id={`rfq-${rfq.id}-reference`} label="Supplier’s reference (optional)" autoComplete="off" />
                  <TextField
                    name="validUntil"
                    id={`rfq-${rfq.id}-valid`}
                    label="Valid until (optional)"
                    placeholder="YYYY-MM-DD"
                    autoComplete="off"
                  />
                </>
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
