import { cautionLines } from '@tacet/vibration';
import { parse } from 'csv-parse/sync';
import ExcelJS from 'exceljs';
import type { Response } from 'supertest';
import { DataSource } from 'typeorm';
import { Design } from '../src/designs/design.entity.js';
import { MailCatcherService } from '../src/mail/mail-catcher.service.js';
import { PurchasingService } from '../src/purchasing/purchasing.service.js';
import { createDesign, createRfqCatalog, releaseDesign, type TestCatalog, type TestDesign } from './factories/review.factory.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';
import { pdfHasText, pdfPageCount, pdfTexts } from './utils/pdf-text.js';

/** supertest parser that keeps the body as bytes. */
const binary = (res: Response, callback: (error: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (chunk: Buffer) => chunks.push(chunk));
  res.on('end', () => callback(null, Buffer.concat(chunks)));
};

describe('purchasing: exports, requests for quotation, queue, report (e2e)', () => {
  let t: TestApp;
  const tokens: Record<string, string> = {};
  const as = (who: string) => ({ Authorization: `Bearer ${tokens[who]}` });
  let withEmail: TestCatalog;
  let noEmail: TestCatalog;
  let released: TestDesign;
  let draft: TestDesign;
  let noEmailDesign: TestDesign;

  const download = (path: string, who: string) => t.http().get(path).set(as(who)).buffer(true).parse(binary);
  const loadDesign = (id: number) =>
    t.app
      .get(DataSource)
      .getRepository(Design)
      .findOneOrFail({ where: { id }, relations: { project: true, author: true, checker: true } });

  beforeAll(async () => {
    t = await createTestApp();
    for (const role of ['admin', 'engineer', 'purchaser', 'viewer', 'catalog_manager'] as const) tokens[role] = await t.loginAs(role);
    tokens.checker = await t.login('checker@tacet.test', 'tacet-demo');
    withEmail = await createRfqCatalog(t, tokens.catalog_manager, 'quotes@springs-test.invalid', 42.5);
    noEmail = await createRfqCatalog(t, tokens.catalog_manager, null, 10);
    released = await createDesign(t, tokens.engineer, withEmail);
    await releaseDesign(t, released.id, tokens.engineer, tokens.checker);
    draft = await createDesign(t, tokens.engineer, withEmail);
    noEmailDesign = await createDesign(t, tokens.engineer, noEmail);
    await releaseDesign(t, noEmailDesign.id, tokens.engineer, tokens.checker);
  });
  afterAll(() => t.close());

  describe('bill of materials', () => {
    it('CSV: attachment name, and figures from the design snapshot (quantity, extended = unit × quantity)', async () => {
      const response = await download(`/api/designs/${released.id}/bom.csv`, 'purchaser');
      expect(response.status).toBe(200);
      expect(response.headers['content-type']).toMatch(/^text\/csv/);
      expect(response.headers['content-disposition']).toBe(
        `attachment; filename="${released.projectName.replace(/ /g, '-')}-${released.name.replace(/ /g, '-')}-rev1-bom.csv"`,
      );
      const all = parse(response.body as Buffer, { relax_column_count: true }) as string[][];
      const rows = all.filter((row) => row.length > 1);
      // the cautions follow the lines, one cell each
      expect(all.filter((row) => row.length === 1).map((row) => row[0])).toEqual(cautionLines('design'));
      expect(rows[0]).toEqual([
        'supplier',
        'part_number',
        'quantity',
        'mount_points',
        'unit_price',
        'extended_price',
        'currency',
        'lead_time_days',
      ]);
      const design = await loadDesign(released.id);
      const snapshotMount = design.snapshot!.mounts.find((m) => m.id === withEmail.mountId)!;
      expect(snapshotMount.unitPrice).toBe(42.5);
      const points = design.snapshot!.candidate.perPoint.filter((p) => p.mountId === withEmail.mountId);
      expect(rows.slice(1)).toEqual([
        [
          withEmail.supplier.name,
          withEmail.partNumber,
          String(points.length),
          points.map((p) => p.label).join(' '),
          '42.5',
          String(42.5 * points.length),
          'USD',
          '12',
        ],
      ]);
      expect(points.length).toBe(4); // one spring at each corner: 4 × 42.50 = 170.00
      expect(rows[1][5]).toBe('170');
    });

    it('XLSX: title (project, design, revision), header with units, totals row', async () => {
      const response = await download(`/api/designs/${released.id}/bom.xlsx`, 'admin');
      expect(response.status).toBe(200);
      expect(response.headers['content-type']).toBe('application/vnd.openxmlformats-officedocument.spreadsheetml.sheet');
      expect(response.headers['content-disposition']).toMatch(/^attachment; filename="[A-Za-z0-9._-]+-rev1-bom\.xlsx"$/);
      const workbook = new ExcelJS.Workbook();
      await workbook.xlsx.load(response.body as unknown as ArrayBuffer);
      const sheet = workbook.worksheets[0];
      expect(String(sheet.getCell('A1').value)).toBe(`${released.projectName} — ${released.name} — rev 1`);
      expect(sheet.getCell('C2').value).toBe('Quantity (pcs)');
      expect(sheet.getCell('B3').value).toBe(withEmail.partNumber);
      expect(sheet.getCell('A4').value).toBe('Total (USD)');
      expect(sheet.getCell('C4').value).toBe(4);
      expect(sheet.getCell('F4').value).toBe(170);
    });

    it('who may export: purchasers released only, the author a draft (marked DRAFT), others 409, viewers 403', async () => {
      expect((await download(`/api/designs/${released.id}/bom.csv`, 'checker')).status).toBe(200);
      expect((await download(`/api/designs/${released.id}/bom.csv`, 'viewer')).status).toBe(403);
      expect((await download(`/api/designs/${draft.id}/bom.csv`, 'purchaser')).status).toBe(404); // drafts do not exist for purchasers
      const other = await download(`/api/designs/${draft.id}/bom.csv`, 'checker');
      expect(other.status).toBe(409);
      expect(JSON.parse((other.body as Buffer).toString()).message).toBe(
        'The bill of materials of an unreleased design goes only to its author, an admin, and engineers while the design is in check',
      );
      const own = await download(`/api/designs/${draft.id}/bom.csv`, 'engineer');
      expect(own.status).toBe(200);
      expect((own.body as Buffer).toString().split('\n')[0]).toMatch(/^DRAFT/);
      const ownXlsx = await download(`/api/designs/${draft.id}/bom.xlsx`, 'engineer');
      const workbook = new ExcelJS.Workbook();
      await workbook.xlsx.load(ownXlsx.body as unknown as ArrayBuffer);
      expect(String(workbook.worksheets[0].getCell('A1').value)).toContain('DRAFT');
    });
  });

  describe('requests for quotation', () => {
    it('e-mails the supplier its BOM lines (CSV, XLSX) with the report, and records the request', async () => {
      const response = await t
        .http()
        .post(`/api/designs/${released.id}/rfqs`)
        .set(as('purchaser'))
        .send({ supplierId: withEmail.supplier.id, message: 'Delivery to site by week 12, please.' });
      expect(response.status).toBe(201);
      expect(response.body).toMatchObject({
        designId: released.id,
        supplier: { id: withEmail.supplier.id, name: withEmail.supplier.name },
        status: 'requested',
        failureReason: null,
        quotedPrice: null,
        createdBy: { name: expect.any(String) },
      });
      expect(response.body.history).toEqual([
        expect.objectContaining({ status: 'requested', note: 'Delivery to site by week 12, please.' }),
      ]);

      const mail = t.app
        .get(MailCatcherService)
        .store.list()
        .find((m) => m.messageId === response.body.messageId);
      expect(mail).toBeDefined();
      expect(mail!.envelope.rcptTo).toEqual(['quotes@springs-test.invalid']);
      expect(mail!.subject).toContain(`${released.name} rev 1`);
      expect(mail!.text).toContain('Delivery to site by week 12, please.');
      const csv = mail!.attachments.find((a) => a.filename.endsWith('-rev1-quote-list.csv'))!;
      expect(csv.contentType).toMatch(/^text\/csv/);
      const rows = (parse(csv.content, { relax_column_count: true }) as string[][]).filter((row) => row.length > 1);
      expect(rows.slice(1).map((r) => [r[0], r[1], r[2]])).toEqual([[withEmail.supplier.name, withEmail.partNumber, '4']]);
      expect(mail!.attachments.map((a) => a.filename.split('-rev1-')[1])).toEqual(['quote-list.csv', 'quote-list.xlsx', 'report.pdf']);
      const pdf = mail!.attachments.find((a) => a.filename.endsWith('.pdf'))!;
      expect(pdf.content.subarray(0, 4).toString()).toBe('%PDF');

      const list = await t.http().get(`/api/designs/${released.id}/rfqs`).set(as('purchaser'));
      expect(list.status).toBe(200);
      expect(list.body.map((r: { id: number }) => r.id)).toContain(response.body.id);
    });

    it('refuses: a supplier without e-mail (422), a supplier not in the BOM (422), a draft (409), viewers and engineers (403)', async () => {
      const missing = await t
        .http()
        .post(`/api/designs/${noEmailDesign.id}/rfqs`)
        .set(as('purchaser'))
        .send({ supplierId: noEmail.supplier.id });
      expect(missing.status).toBe(422);
      expect(missing.body.message).toBe(`Supplier ${noEmail.supplier.name} has no contact e-mail`);
      const notInBom = await t
        .http()
        .post(`/api/designs/${released.id}/rfqs`)
        .set(as('purchaser'))
        .send({ supplierId: noEmail.supplier.id });
      expect(notInBom.status).toBe(422);
      expect(
        (await t.http().post(`/api/designs/${draft.id}/rfqs`).set(as('admin')).send({ supplierId: withEmail.supplier.id })).status,
      ).toBe(409);
      for (const who of ['viewer', 'engineer']) {
        expect(
          (await t.http().post(`/api/designs/${released.id}/rfqs`).set(as(who)).send({ supplierId: withEmail.supplier.id })).status,
        ).toBe(403);
      }
    });

    it('status moves forward only; a quote needs a price for every line', async () => {
      const created = await t
        .http()
        .post(`/api/designs/${released.id}/rfqs`)
        .set(as('purchaser'))
        .send({ supplierId: withEmail.supplier.id });
      const id = created.body.id;
      const lineId = created.body.lines[0].id;
      const patch = (body: object) => t.http().patch(`/api/rfqs/${id}`).set(as('purchaser')).send(body);
      expect((await patch({ status: 'quoted' })).status).toBe(400);
      const quoted = await patch({ status: 'quoted', lines: [{ lineId, unitPrice: 41.25 }], note: 'Quote Q-77' });
      expect(quoted.status).toBe(200);
      expect(quoted.body).toMatchObject({ status: 'quoted', quotedPrice: 165 });
      expect(quoted.body.quotedAt).toEqual(expect.any(String));
      expect((await patch({ status: 'quoted', lines: [{ lineId, unitPrice: 40 }] })).status).toBe(409);
      expect((await patch({ status: 'received' })).status).toBe(200); // skipping ahead is still forward
      const back = await patch({ status: 'ordered' });
      expect(back.status).toBe(409);
      expect(back.body.message).toBe('A request for quotation cannot go from received to ordered');
      expect((await patch({ status: 'requested' })).status).toBe(400);
      const list = await t.http().get(`/api/designs/${released.id}/rfqs`).set(as('admin'));
      const rfq = list.body.find((r: { id: number }) => r.id === id);
      expect(rfq.history.map((h: { status: string }) => h.status)).toEqual(['requested', 'quoted', 'received']);
      expect(rfq.history[1].note).toBe('Quote Q-77');
      expect((await t.http().post(`/api/rfqs/${id}/retry`).set(as('purchaser'))).status).toBe(409);
    });
  });

  describe('purchasing queue', () => {
    it('lists released designs newest first with line count, total and RFQ counts', async () => {
      const response = await t.http().get('/api/purchasing/designs').set(as('purchaser'));
      expect(response.status).toBe(200);
      const ids = response.body.map((d: { designId: number }) => d.designId);
      expect(ids.indexOf(noEmailDesign.id)).toBeLessThan(ids.indexOf(released.id));
      expect(ids).not.toContain(draft.id);
      const item = response.body.find((d: { designId: number }) => d.designId === released.id);
      expect(item).toMatchObject({
        projectId: released.projectId,
        projectName: released.projectName,
        name: released.name,
        revision: 1,
        status: 'released',
        lineCount: 1,
        total: 170,
        currency: 'USD',
      });
      expect(item.rfqs).toEqual({ requested: 1, quoted: 0, ordered: 0, received: 1, failed: 0 });
      expect(item.openRequests).toEqual([
        expect.objectContaining({ status: 'requested', supplier: expect.objectContaining({ id: withEmail.supplier.id }) }),
      ]);
      expect(Date.parse(item.releasedAt)).not.toBeNaN();
      expect((await t.http().get('/api/purchasing/designs').set(as('engineer'))).status).toBe(403);
    });
  });

  describe('calculation report', () => {
    it('PDF over HTTP for every role that reads a released design; at least two pages', async () => {
      for (const who of ['purchaser', 'viewer', 'engineer']) {
        const response = await download(`/api/designs/${released.id}/report.pdf`, who);
        expect(response.status).toBe(200);
        expect(response.headers['content-type']).toBe('application/pdf');
        expect(response.headers['content-disposition']).toMatch(/-rev1-report\.pdf"$/);
        const pdf = response.body as Buffer;
        expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
        expect(pdfPageCount(pdf)).toBeGreaterThanOrEqual(2);
      }
      expect((await download(`/api/designs/${draft.id}/report.pdf`, 'viewer')).status).toBe(403);
      expect((await download(`/api/designs/${draft.id}/report.pdf`, 'engineer')).status).toBe(200);
    });

    it('text read back: design name, part number, the licensed-engineer caution; DRAFT watermark only on drafts', async () => {
      const service = t.app.get(PurchasingService);
      const releasedPdf = await service.reportOf(await loadDesign(released.id), false);
      expect(pdfTexts(releasedPdf).length).toBeGreaterThanOrEqual(2); // Noto Sans regular and bold embedded
      expect(pdfHasText(releasedPdf, released.name)).toBe(true);
      expect(pdfHasText(releasedPdf, withEmail.partNumber)).toBe(true);
      expect(pdfHasText(releasedPdf, 'review by a qualified, licensed engineer')).toBe(true);
      expect(pdfHasText(releasedPdf, 'DRAFT')).toBe(false);

      const draftPdf = await service.reportOf(await loadDesign(draft.id), false);
      expect(pdfPageCount(draftPdf)).toBeGreaterThanOrEqual(2);
      const watermarks = pdfTexts(draftPdf).map((text) => text.match(/(^| )DRAFT( |$)/g)?.length ?? 0);
      expect(Math.max(...watermarks)).toBeGreaterThanOrEqual(pdfPageCount(draftPdf));
      expect(draftPdf.toString('latin1')).toMatch(/\/ca 0\.12/); // the watermark's fill opacity
    });
  });
});
