import { nextStatuses, rfqStatusSchema } from './rfq-status-schema';

async function problems(current: Parameters<typeof rfqStatusSchema>[0], values: object): Promise<string[]> {
  try {
    await rfqStatusSchema(current).validate({ lines: [], reference: '', validUntil: '', note: '', ...values }, { abortEarly: false });
    return [];
  } catch (error) {
    return (error as { errors: string[] }).errors;
  }
}

const line = (unitPrice: string, leadTimeDays = '') => ({ lineId: 1, unitPrice, leadTimeDays });

describe('RFQ state rules', () => {
  it('move forward only, and a failed request has no next state', () => {
    expect(nextStatuses('requested')).toEqual(['quoted', 'ordered', 'received']);
    expect(nextStatuses('quoted')).toEqual(['ordered', 'received']);
    expect(nextStatuses('ordered')).toEqual(['received']);
    expect(nextStatuses('received')).toEqual([]);
    expect(nextStatuses('failed')).toEqual([]);
  });

  it('require a unit price on every line of a quote, and whole days of lead time', async () => {
    expect(await problems('requested', { status: 'quoted', lines: [line('')] })).toEqual(['Enter the unit price of this line.']);
    expect(await problems('requested', { status: 'quoted', lines: [line('-3')] })).toEqual([
      'Enter the unit price as a positive number, e.g. 41.25.',
    ]);
    expect(await problems('requested', { status: 'quoted', lines: [line('41.25', '2.5')] })).toEqual([
      'Enter the lead time in whole days, e.g. 21.',
    ]);
    expect(await problems('requested', { status: 'quoted', lines: [line('41.25', '21')], validUntil: '30.06.2026' })).toEqual([
      'Enter the date as YYYY-MM-DD.',
    ]);
    expect(await problems('requested', { status: 'quoted', lines: [line('41.25', '21')], validUntil: '2026-06-30' })).toEqual([]);
    expect(await problems('quoted', { status: 'ordered', lines: [line('')], note: 'PO 4471' })).toEqual([]);
  });

  it('refuse a step back', async () => {
    expect(await problems('ordered', { status: 'quoted', lines: [line('10')] })).toEqual([
      'A request moves forward only: choose a later state.',
    ]);
  });
});
