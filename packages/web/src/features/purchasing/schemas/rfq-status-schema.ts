import * as yup from 'yup';

import { RECORDED_STATUSES, type RecordedRfqStatus, type RfqStatus } from '../types';

/** The order a request for quotation moves in; a state is only ever followed by a later one. */
const ORDER: Record<RfqStatus, number> = { requested: 0, quoted: 1, ordered: 2, received: 3, failed: -1 };

/**
 * The states that may be recorded after `current` (forward only). A failed request has none:
 * it is sent again instead.
 */
export function nextStatuses(current: RfqStatus): RecordedRfqStatus[] {
  if (current === 'failed') return [];
  return RECORDED_STATUSES.filter((status) => ORDER[status] > ORDER[current]);
}

/** One line of a quote as typed. */
export interface QuotedLineValues {
  lineId: number;
  unitPrice: string;
  leadTimeDays: string;
}

export interface RfqStatusValues {
  status: RecordedRfqStatus | '';
  /** With a quote: a unit price (and lead time) per line of the request. */
  lines: QuotedLineValues[];
  reference: string;
  /** YYYY-MM-DD (a date input). */
  validUntil: string;
  note: string;
}

const isQuote = { is: 'quoted' } as const;

export function rfqStatusSchema(current: RfqStatus) {
  const allowed = nextStatuses(current);
  return yup.object({
    status: yup
      .string()
      .required('Choose the new state.')
      .oneOf(allowed as string[], 'A request moves forward only: choose a later state.'),
    lines: yup.array().when('status', {
      ...isQuote,
      then: (schema) =>
        schema.of(
          yup.object({
            lineId: yup.number().required(),
            unitPrice: yup
              .string()
              .trim()
              .required('Enter the unit price of this line.')
              .test('positive', 'Enter the unit price as a positive number, e.g. 41.25.', (value) => {
                const price = Number(value);
                return !value || (Number.isFinite(price) && price > 0);
              }),
            leadTimeDays: yup
              .string()
              .trim()
              .test('days', 'Enter the lead time in whole days, e.g. 21.', (value) => !value || /^\d{1,4}$/.test(value)),
          }),
        ),
    }),
    reference: yup.string().trim().max(200, 'Keep the reference under 200 characters.'),
    validUntil: yup
      .string()
      .trim()
      .test('date', 'Enter the date as YYYY-MM-DD.', (value) => !value || /^\d{4}-\d{2}-\d{2}$/.test(value)),
    note: yup.string().trim().max(2000, 'Keep the note under 2000 characters.'),
  });
}
