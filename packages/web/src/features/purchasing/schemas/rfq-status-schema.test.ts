import { nextStatuses, rfqStatusSchema } from './rfq-status-schema';

async function problems(current: Parameters<typeof rfqStatusSchema>[0], values: object): Promise<string[]> {
  try {
    await rfqStatusSchema(current).validate(values, { abortEarly: false });
    return [];
  } catch (error) {
    return (error as { errors: string[] }).errors;
  }
}

describe('RFQ state rules', () => {
  it('move forward only, and a failed request has no next state', () => {
    expect(nextStatuses('requested')).toEqual(['quoted', 'ordered', 'received']);
    expect(nextStatuses('quoted')).toEqual(['ordered', 'received']);
    expect(nextStatuses('ordered')).toEqual(['received']);
    expect(nextStatuses('received')).toEqual([]);
    expect(nextStatuses('failed')).toEqual([]);
  });

  it('require a price with a quote', async () => {
    expect(await problems('requested', { status: 'quoted', quotedPrice: '', note: '' })).toEqual(['A quote needs its price.']);
    expect(await problems('requested', { status: 'quoted', quotedPrice: '-3', note: '' })).toEqual([
      'Enter the quoted price as a positive number, e.g. 1240.50.',
    ]);
    expect(await problems('requested', { status: 'quoted', quotedPrice: '1240.5', note: '' })).toEqual([]);
    expect(await problems('quoted', { status: 'ordered', quotedPrice: '', note: 'PO 4471' })).toEqual([]);
  });

  it('refuse a step back', async () => {
    expect(await problems('ordered', { status: 'quoted', quotedPrice: '10', note: '' })).toEqual([
      'A request moves forward only: choose a later state.',
    ]);
  });
});
