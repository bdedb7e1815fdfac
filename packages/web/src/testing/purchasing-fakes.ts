import type { PurchasingDesign, Rfq, RfqStatus } from '@/features/purchasing/types';
import type { BomLine, Design } from '@/types/design-api';

import { demoCandidates, makeDesign, QUELLBROOK, STILLMOOR } from './design-fakes';
import { TEST_USERS } from './factories';
import type { FakeApi } from './fake-api';

/** Invented BOM, queue rows and requests for quotation for the purchasing tests. */

/** 4 × QB-HS-300 at 92.00 = 368.00; 2 × SM-LV-300 at 70.00 = 140.00; 2 × SM-LV-280 at 68.00 = 136.00 → 644.00. */
export function demoBom(): BomLine[] {
  return [
    {
      supplier: QUELLBROOK,
      partNumber: 'QB-HS-300',
      mountId: 11,
      quantity: 4,
      mountPoints: ['A', 'B', 'C', 'D'],
      unitPrice: 92,
      extendedPrice: 368,
      currency: 'USD',
      leadTimeDays: 21,
    },
    {
      supplier: STILLMOOR,
      partNumber: 'SM-LV-300',
      mountId: 900,
      quantity: 2,
      mountPoints: ['A', 'B'],
      unitPrice: 70,
      extendedPrice: 140,
      currency: 'USD',
      leadTimeDays: 35,
    },
    {
      supplier: STILLMOOR,
      partNumber: 'SM-LV-280',
      mountId: 902,
      quantity: 2,
      mountPoints: ['C', 'D'],
      unitPrice: 68,
      extendedPrice: 136,
      currency: 'USD',
      leadTimeDays: 35,
    },
  ];
}

export function releasedDesign(overrides: Partial<Design> = {}): Design {
  return makeDesign({
    id: 81,
    name: 'CHW pump P-2 skid',
    projectName: 'North Loop Chilled Water Plant',
    revision: 2,
    status: 'released',
    chosen: demoCandidates()[0]!,
    bom: demoBom(),
    checker: { id: 4, name: 'Chris Checker' },
    ...overrides,
  });
}

let nextRfqId = 300;

export function makeRfq(overrides: Partial<Rfq> = {}): Rfq {
  const status: RfqStatus = overrides.status ?? 'requested';
  const buyer = { id: TEST_USERS.purchaser.id, name: TEST_USERS.purchaser.name };
  return {
    id: overrides.id ?? nextRfqId++,
    designId: 81,
    supplier: QUELLBROOK,
    status,
    messageId: status === 'failed' ? null : '<rfq@tacet.test>',
    failureReason: null,
    machineCount: 1,
    lines: [
      {
        id: 900,
        partNumber: 'QB-HS-220',
        quantityPerMachine: 4,
        quantity: 4,
        mountPoints: ['A', 'B', 'C', 'D'],
        unitPrice: null,
        leadTimeDays: null,
      },
    ],
    quotedPrice: null,
    quoteCurrency: null,
    quoteReference: null,
    quoteValidUntil: null,
    quotedAt: null,
    orderedAt: null,
    dueBy: null,
    createdBy: buyer,
    createdAt: '2025-02-03T09:00:00.000Z',
    updatedAt: '2025-02-03T09:00:00.000Z',
    history: [{ at: '2025-02-03T09:00:00.000Z', status, user: buyer, note: null }],
    ...overrides,
  };
}

export function queueRow(overrides: Partial<PurchasingDesign> = {}): PurchasingDesign {
  return {
    designId: 81,
    projectId: 1,
    projectName: 'North Loop Chilled Water Plant',
    name: 'CHW pump P-2 skid',
    revision: 2,
    status: 'released',
    releasedAt: '2025-02-01T14:00:00.000Z',
    lineCount: 3,
    total: 644,
    currency: 'USD',
    rfqs: { requested: 1, quoted: 0, ordered: 0, received: 0, failed: 1 },
    openRequests: [],
    ...overrides,
  };
}

export interface PurchasingServer {
  design: Design;
  rfqs: Rfq[];
}

/** Answers the design, its RFQs, sending, retrying and recording like the server (in memory). */
export function servePurchasing(fake: FakeApi, design = releasedDesign(), rfqs: Rfq[] = []): PurchasingServer {
  const state: PurchasingServer = { design, rfqs: [...rfqs] };
  fake
    .on('get', '/designs/:id', ({ params }) =>
      Number(params.id) === state.design.id
        ? { status: 200, data: state.design }
        : { status: 404, data: { statusCode: 404, message: 'Design not found' } },
    )
    .on('get', '/designs/:id/rfqs', () => ({ status: 200, data: state.rfqs }))
    .on('post', '/designs/:id/rfqs/preview', ({ body }) => {
      const { supplierId, machineCount = 1 } = body as { supplierId: number; machineCount?: number };
      const lines = state.design.bom.filter((line) => line.supplier.id === supplierId);
      if (lines.length === 0) return { status: 422, data: { statusCode: 422, message: 'That supplier has no line in this BOM' } };
      const supplier = lines[0]!.supplier;
      return {
        status: 200,
        data: {
          supplier,
          to: `quotes@${supplier.name.toLowerCase().replace(/\W+/g, '-')}.invalid`,
          replyTo: 'buyer@tacet.test',
          subject: `Request for quotation: ${state.design.name} rev ${state.design.revision}`,
          text: `Hello ${supplier.name},\n\nPlease quote the resilient mounts below.`,
          machineCount,
          lines: lines.map((line) => ({
            id: 0,
            partNumber: line.partNumber,
            quantityPerMachine: line.quantity,
            quantity: line.quantity * machineCount,
            mountPoints: line.mountPoints,
            unitPrice: null,
            leadTimeDays: null,
          })),
          attachments: [
            { filename: 'quote-list.csv', contentType: 'text/csv', size: 120 },
            { filename: 'report.pdf', contentType: 'application/pdf', size: 48_000 },
          ],
        },
      };
    })
    .on('post', '/designs/:id/rfqs', ({ body }) => {
      const { supplierId } = body as { supplierId: number };
      const supplier = state.design.bom.find((line) => line.supplier.id === supplierId)?.supplier;
      if (!supplier) return { status: 422, data: { statusCode: 422, message: 'That supplier has no line in this BOM' } };
      const rfq = makeRfq({ designId: state.design.id, supplier, createdAt: '2025-02-05T10:00:00.000Z' });
      state.rfqs = [...state.rfqs, rfq];
      return { status: 201, data: rfq };
    })
    .on('post', '/rfqs/:id/retry', ({ params }) => {
      const found = state.rfqs.find((rfq) => rfq.id === Number(params.id))!;
      const sent: Rfq = { ...found, status: 'requested', failureReason: null };
      state.rfqs = state.rfqs.map((rfq) => (rfq.id === sent.id ? sent : rfq));
      return { status: 200, data: sent };
    })
    .on('patch', '/rfqs/:id', ({ params, body }) => {
      const update = body as { status: RfqStatus; lines?: { lineId: number; unitPrice: number; leadTimeDays?: number }[] };
      const found = state.rfqs.find((rfq) => rfq.id === Number(params.id))!;
      const lines = found.lines.map((line) => {
        const quoted = update.lines?.find((typed) => typed.lineId === line.id);
        return quoted ? { ...line, unitPrice: quoted.unitPrice, leadTimeDays: quoted.leadTimeDays ?? null } : line;
      });
      const total = update.lines ? lines.reduce((sum, line) => sum + (line.unitPrice ?? 0) * line.quantity, 0) : found.quotedPrice;
      const next: Rfq = { ...found, status: update.status, lines, quotedPrice: total };
      state.rfqs = state.rfqs.map((rfq) => (rfq.id === next.id ? next : rfq));
      return { status: 200, data: next };
    });
  return state;
}
