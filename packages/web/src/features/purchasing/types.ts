/**
 * The purchasing API's shapes: aliases of the types generated from the server's OpenAPI document
 * (`@/api/schema`, `npm run api-types`); the inputs of the mutations add the ids they address.
 */
import { rfqProgressStatusValues, rfqStatusValues, type ApiSchemas } from '@/api/schema';

/** Requests for quotation by state, as the purchasing queue counts them. */
export type RfqCounts = ApiSchemas['RfqCountsDto'];

/**
 * One released design in the purchasing queue (`GET /api/purchasing/designs`); `total` is the
 * sum of the extended prices, null when unknown or the lines mix currencies.
 */
export type PurchasingDesign = ApiSchemas['PurchasingDesignDto'];

/** Every state of a request for quotation, in the server's order. */
export const RFQ_STATUSES = rfqStatusValues;
export type RfqStatus = ApiSchemas['RfqStatus'];

/** The states a purchaser records by hand (`PATCH /api/rfqs/:id`), in their forward order. */
export const RECORDED_STATUSES = rfqProgressStatusValues;
export type RecordedRfqStatus = ApiSchemas['RfqProgressStatus'];

export type RfqHistoryEntry = ApiSchemas['RfqEventDto'];

/** A request for quotation sent to one supplier for one released design. */
export type Rfq = ApiSchemas['RfqDto'];

/** `POST /api/designs/:id/rfqs`: the design and the body. */
export type SendRfqInput = ApiSchemas['CreateRfqDto'] & { designId: number };

/** `PATCH /api/rfqs/:id`: the request, its design (to refresh) and the body. */
export type UpdateRfqInput = ApiSchemas['UpdateRfqDto'] & { rfqId: number; designId: number };

/** `POST /api/designs/:id/rfqs/preview`: the recipient, text, lines and attachments, before sending. */
export type RfqPreview = ApiSchemas['RfqPreviewDto'];

/** A request still open, as the queue lists it. */
export type OpenRfq = ApiSchemas['OpenRfqDto'];
