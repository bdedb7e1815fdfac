/** Where a request for quotation stands; `failed` means the e-mail could not be sent. */
export const RFQ_STATUSES = ['requested', 'quoted', 'ordered', 'received', 'failed'] as const;
export type RfqStatus = (typeof RFQ_STATUSES)[number];

/** The statuses a purchaser records by hand, in the only order they may follow. */
export const RFQ_PROGRESS = ['requested', 'quoted', 'ordered', 'received'] as const;
export type RfqProgressStatus = Exclude<(typeof RFQ_PROGRESS)[number], 'requested'>;
export const RFQ_RECORDABLE: readonly RfqProgressStatus[] = ['quoted', 'ordered', 'received'];
