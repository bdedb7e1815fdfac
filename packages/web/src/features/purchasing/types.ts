import type { DesignStatus, PersonRef, SupplierRef } from '@/types/design-api';

/** Requests for quotation by state, as the purchasing queue counts them. */
export interface RfqCounts {
  requested: number;
  quoted: number;
  ordered: number;
  received: number;
  failed: number;
}

/** One released design in the purchasing queue (`GET /api/purchasing/designs`). */
export interface PurchasingDesign {
  designId: number;
  projectId: number;
  projectName: string;
  name: string;
  revision: number;
  status: DesignStatus;
  releasedAt: string | null;
  lineCount: number;
  /** Sum of the extended prices; null when unknown or the lines mix currencies. */
  total: number | null;
  currency: string | null;
  rfqs: RfqCounts;
}

export const RFQ_STATUSES = ['requested', 'quoted', 'ordered', 'received', 'failed'] as const;
export type RfqStatus = (typeof RFQ_STATUSES)[number];

/** The states a purchaser records by hand (`PATCH /api/rfqs/:id`), in their forward order. */
export const RECORDED_STATUSES = ['quoted', 'ordered', 'received'] as const;
export type RecordedRfqStatus = (typeof RECORDED_STATUSES)[number];

export interface RfqHistoryEntry {
  at: string;
  status: RfqStatus;
  user: PersonRef | null;
  note: string | null;
}

/** A request for quotation sent to one supplier for one released design. */
export interface Rfq {
  id: number;
  designId: number;
  supplier: SupplierRef;
  status: RfqStatus;
  messageId: string | null;
  failureReason: string | null;
  quotedPrice: number | null;
  quotedAt: string | null;
  createdBy: PersonRef;
  createdAt: string;
  updatedAt: string;
  history: RfqHistoryEntry[];
}

export interface SendRfqInput {
  designId: number;
  supplierId: number;
  message?: string;
}

export interface UpdateRfqInput {
  rfqId: number;
  designId: number;
  status: RecordedRfqStatus;
  quotedPrice?: number;
  quotedAt?: string;
  note?: string;
}
