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

export interface RfqStatusValues {
  status: RecordedRfqStatus | '';
  /** As typed; a number once valid. */
  quotedPrice: string;
  note: string;
}

export function rfqStatusSchema(current: RfqStatus) {
  const allowed = nextStatuses(current);
  return yup.object({
    status: yup
      .string()
      .required('Choose the new state.')
      .oneOf(allowed as string[], 'A request moves forward only: choose a later state.'),
    quotedPrice: yup.string().when('status', {
      is: 'quoted',
      then: (schema) =>
        schema
          .trim()
          .required('A quote needs its price.')
          .test('positive', 'Enter the quoted price as a positive number, e.g. 1240.50.', (value) => {
            if (value === undefined || value === '') return true; // "required" speaks for an empty field
            const price = Number(value);
            return Number.isFinite(price) && price > 0;
          }),
      otherwise: (schema) => schema.trim(),
    }),
    note: yup.string().trim().max(2000, 'Keep the note under 2000 characters.'),
  });
}
