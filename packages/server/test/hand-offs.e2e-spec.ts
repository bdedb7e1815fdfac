import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { cautionLines } from '@tacet/vibration';
import { parse } from 'csv-parse/sync';
import ExcelJS from 'exceljs';
import { DataSource } from 'typeorm';
import { PasswordResetToken } from '../src/auth/password-reset-token.entity.js';
import { hashToken } from '../src/auth/password-reset.service.js';
import { Design } from '../src/designs/design.entity.js';
import { MailCatcherService } from '../src/mail/mail-catcher.service.js';
import type { CapturedMail } from '../src/mail/captured-mail-store.js';
import { PurchasingService } from '../src/purchasing/purchasing.service.js';
import { createDesign, createRfqCatalog, releaseDesign, type TestCatalog } from './factories/review.factory.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';
import { inflatePdf, pdfHasText, pdfTexts } from './utils/pdf-text.js';

const PUBLIC_URL = 'https://tacet.example.test/app';
/** A catalog price unlikely to appear anywhere by chance: 987.65 each, 3,950.60 for four. */
const UNIT_PRICE = 987.65;

describe('hand-offs between people (e2e)', () => {
  let t: TestApp;
  let catalog: TestCatalog;
  const tokens: Record<string, string> = {};
  const ids: Record<string, number> = {};
  const as = (who: string) => ({ Authorization: `Bearer ${tokens[who]}` });
  const mails = (): CapturedMail[] => t.app.get(MailCatcherService).store.list();
  const mailTo = (address: string, subject: string) => mails().filter((m) => m.to.includes(address) && m.subject.includes(subject));
  const transition = (id: number, who: string, body: object) => t.http().post(`/api/designs/${id}/transitions`).set(as(who)).send(body);
  const history = (id: number, who = 'engineer') => t.http().get(`/api/designs/${id}/history`).set(as(who));
  const myWork = async (who: string) => (await t.http().get('/api/my-work').set(as(who)).expect(200)).body;
  const idsOf = (items: { designId: number }[]) => items.map((item) => item.designId);
  const waitFor = async <T>(find: () => T | undefined): Promise<T> => {
    for (let i = 0; i < 100; i++) {
      const found = find();
      if (found) return found;
      await new Promise((resolve) => setTimeout(resolve, 50));
    }
    throw new Error('not found in time');
  };

  beforeAll(async () => {
    t = await createTestApp({ env: { TACET_PUBLIC_URL: `${PUBLIC_URL}/` } });
    for (const role of ['admin', 'engineer', 'purchaser', 'viewer', 'catalog_manager'] as const) tokens[role] = await t.loginAs(role);
    tokens.checker = await t.login('checker@tacet.test', 'tacet-demo');
    for (const who of ['admin', 'engineer', 'checker', 'viewer']) ids[who] = (await t.http().get('/api/auth/me').set(as(who))).body.id;
    catalog = await createRfqCatalog(t, tokens.catalog_manager, 'quotes@handoff-springs.invalid', UNIT_PRICE);
  });
  afterAll(() => t.close());

  describe('sending for check, returning, releasing', () => {
    it('takes a note and a named checker; only that checker is mailed, with a link to the design', async () => {
      const design = await createDesign(t, tokens.engineer, catalog);
      const sent = await transition(design.id, 'engineer', { to: 'in_review', note: 'Please look at point C.', checkerId: ids.checker });
      expect(sent.status).toBe(200);
      const [entry] = (await history(design.id)).body;
      expect(entry).toMatchObject({
        to: 'in_review',
        note: 'Please look at point C.',
        requestedChecker: { id: ids.checker },
        changes: null,
      });
      const toChecker = mailTo('checker@tacet.test', `Please check: ${design.name} rev 1`);
      expect(toChecker).toHaveLength(1);
      expect(toChecker[0].text).toContain('asked you to check it');
      expect(toChecker[0].text).toContain('> Please look at point C.');
      expect(toChecker[0].text).toContain(`${PUBLIC_URL}/designs/${design.id}`);
      expect(mailTo('admin@tacet.test', `Please check: ${design.name}`)).toHaveLength(0);
    });

    it('lists who may be asked to check: active engineers and admins other than the author', async () => {
      const design = await createDesign(t, tokens.engineer, catalog);
      const checkers = await t.http().get(`/api/designs/${design.id}/checkers`).set(as('engineer'));
      expect(checkers.status).toBe(200);
      const listed = checkers.body.map((person: { id: number }) => person.id);
      expect(listed).toEqual(expect.arrayContaining([ids.checker, ids.admin]));
      expect(listed).not.toContain(ids.engineer);
      expect(listed).not.toContain(ids.viewer);
      expect((await t.http().get(`/api/designs/${design.id}/checkers`).set(as('viewer'))).status).toBe(403);
    });

    it('refuses a named checker who is the author, not an engineer, or inactive, and a note or checker with another move', async () => {
      const design = await createDesign(t, tokens.engineer, catalog);
      for (const checkerId of [ids.engineer, ids.viewer, 999999]) {
        const refused = await transition(design.id, 'engineer', { to: 'in_review', checkerId });
        expect(refused.status).toBe(400);
        expect(refused.body.errors).toEqual([
          { field: 'checkerId', message: 'Ask an active engineer other than the author of this design to check it' },
        ]);
      }
      await transition(design.id, 'engineer', { to: 'in_review' }).expect(200);
      const noted = await transition(design.id, 'checker', { to: 'released', note: 'x' });
      expect(noted.status).toBe(400);
      expect(noted.body.errors[0].field).toBe('note');
      expect((await transition(design.id, 'checker', { to: 'draft', comment: 'x', checkerId: ids.admin })).status).toBe(400);
      expect((await t.http().get(`/api/designs/${design.id}`).set(as('engineer'))).body.status).toBe('in_review');
    });

    it('returning mails the author the comment; the resubmission carries the reply and what changed, in each reader’s units', async () => {
      const design = await createDesign(t, tokens.engineer, catalog);
      await transition(design.id, 'engineer', { to: 'in_review' }).expect(200);
      await transition(design.id, 'checker', { to: 'draft', comment: 'Move B out by 50 mm.' }).expect(200);
      const returned = mailTo('engineer@tacet.test', `Returned to you: ${design.name} rev 1`);
      expect(returned).toHaveLength(1);
      expect(returned[0].text).toContain('> Move B out by 50 mm.');
      expect(returned[0].text).toContain(`${PUBLIC_URL}/designs/${design.id}`);
      expect(idsOf((await myWork('engineer')).returned)).toContain(design.id);
      expect(idsOf((await myWork('engineer')).drafts)).not.toContain(design.id);

      // the author moves point B and the machine's mass, chooses again and resends with a reply
      const current = (await t.http().get(`/api/designs/${design.id}`).set(as('engineer'))).body;
      const input = structuredClone(current.input);
      input.mountPoints[1].x = 0.85;
      input.components[0].massKg = 1100;
      const saved = await t.http().put(`/api/designs/${design.id}`).set(as('engineer')).send({ version: current.version, input });
      expect(saved.status).toBe(200);
      await t
        .http()
        .put(`/api/designs/${design.id}`)
        .set(as('engineer'))
        .send({ version: saved.body.version, chosenMountId: catalog.mountId })
        .expect(200);
      // the checker reads US customary units
      await t.http().patch('/api/auth/me').set(as('checker')).send({ unitSystem: 'US' }).expect(200);
      try {
        await transition(design.id, 'engineer', { to: 'in_review', note: 'Moved B; the machine is heavier too.' }).expect(200);
        const entries = (await history(design.id)).body;
        const resent = entries.at(-1);
        expect(resent).toMatchObject({ note: 'Moved B; the machine is heavier too.', changes: { sinceRevision: null } });
        expect(resent.changes.items).toEqual([
          expect.objectContaining({
            field: 'components[Machine].massKg',
            label: 'Machine: mass',
            before: 1000,
            after: 1100,
            beforeText: '1,000 kg',
            afterText: '1,100 kg',
          }),
          expect.objectContaining({
            field: 'mountPoints[B].x',
            label: 'Mount point B: x position',
            before: 0.8,
            after: 0.85,
            beforeText: '0.8 m',
            afterText: '0.85 m',
          }),
        ]);
        const inUs = (await history(design.id, 'checker')).body.at(-1).changes.items;
        // 1000 kg / 0.45359237 = 2204.6 lb; 0.8 m / 0.0254 = 31.50 in (NIST SP 811 factors)
        expect(inUs.map((item: { beforeText: string; afterText: string }) => [item.beforeText, item.afterText])).toEqual([
          ['2,205 lb', '2,425 lb'],
          ['31.5 in', '33.5 in'],
        ]);
        const resentMail = mailTo('checker@tacet.test', `Please check: ${design.name} rev 1`).find((m) => m.text.includes('Moved B'));
        expect(resentMail!.text).toContain('What changed since it was last sent for check:');
        expect(resentMail!.text).toContain('- Mount point B: x position: 31.5 in → 33.5 in');
        expect(resentMail!.text).toContain('- Machine: mass: 2,205 lb → 2,425 lb');
      } finally {
        await t.http().patch('/api/auth/me').set(as('checker')).send({ unitSystem: 'SI' }).expect(200);
      }
    });

    it('releasing mails the author and the purchasers (their link leads to purchasing) with the release notes, also printed in the report', async () => {
      const design = await createDesign(t, tokens.engineer, catalog);
      await transition(design.id, 'engineer', { to: 'in_review' }).expect(200);
      await transition(design.id, 'checker', { to: 'released', comment: 'Checked against the site survey of March.' }).expect(200);
      const toAuthor = mailTo('engineer@tacet.test', `Released: ${design.name} rev 1`);
      const toBuyer = mailTo('buyer@tacet.test', `Released: ${design.name} rev 1`);
      expect(toAuthor[0].text).toContain('> Checked against the site survey of March.');
      expect(toAuthor[0].text).toContain(`${PUBLIC_URL}/designs/${design.id}`);
      expect(toBuyer[0].text).toContain(`${PUBLIC_URL}/purchasing/designs/${design.id}`);
      const service = t.app.get(PurchasingService);
      const row = await t.app
        .get(DataSource)
        .getRepository(Design)
        .findOneOrFail({ where: { id: design.id }, relations: { project: true, author: true, checker: true } });
      expect(pdfHasText(await service.reportOf(row, false), 'Release notes: Checked against the site survey of March.')).toBe(true);
    });
  });

  describe('work lists (GET /api/my-work)', () => {
    it('gives each role what it has to do', async () => {
      const mine = await createDesign(t, tokens.engineer, catalog);
      const theirs = await createDesign(t, tokens.checker, catalog);
      const askedOfEngineer = await createDesign(t, tokens.checker, catalog);
      await transition(theirs.id, 'checker', { to: 'in_review' }).expect(200);
      await transition(askedOfEngineer.id, 'checker', { to: 'in_review', checkerId: ids.engineer, note: 'You know this pump.' }).expect(
        200,
      );
      await transition(mine.id, 'engineer', { to: 'in_review' }).expect(200);

      const engineer = await myWork('engineer');
      expect(Object.keys(engineer).sort()).toEqual(['drafts', 'released', 'returned', 'toCheck']);
      expect(idsOf(engineer.toCheck)).toEqual(expect.arrayContaining([theirs.id, askedOfEngineer.id]));
      expect(idsOf(engineer.toCheck)).not.toContain(mine.id); // not their own
      expect(engineer.toCheck[0]).toMatchObject({
        designId: askedOfEngineer.id, // asked of them: first
        projectId: askedOfEngineer.projectId,
        projectName: askedOfEngineer.projectName,
        name: askedOfEngineer.name,
        revision: 1,
        status: 'in_review',
        updatedAt: expect.any(String),
        requestedChecker: { id: ids.engineer },
        lastComment: 'You know this pump.',
      });
      expect(idsOf((await myWork('checker')).toCheck)).toContain(mine.id);

      // released: a purchaser sees it until a request for quotation goes out; engineers see recent releases
      await transition(mine.id, 'checker', { to: 'released' }).expect(200);
      expect(idsOf((await myWork('purchaser')).released)).toContain(mine.id);
      expect(idsOf((await myWork('engineer')).released)).toContain(mine.id);
      await t.http().post(`/api/designs/${mine.id}/rfqs`).set(as('purchaser')).send({ supplierId: catalog.supplier.id }).expect(201);
      expect(idsOf((await myWork('purchaser')).released)).not.toContain(mine.id);

      for (const who of ['purchaser', 'viewer', 'catalog_manager']) {
        const work = await myWork(who);
        expect([work.toCheck, work.returned, work.drafts]).toEqual([[], [], []]);
      }
      expect((await t.http().get('/api/my-work')).status).toBe(401);
    });

    it('the project list counts designs by state', async () => {
      const design = await createDesign(t, tokens.engineer, catalog);
      await transition(design.id, 'engineer', { to: 'in_review' }).expect(200);
      const project = (await t.http().get(`/api/projects/${design.projectId}`).set(as('viewer'))).body;
      expect(project.statusCounts).toEqual({ draft: 0, in_review: 1, released: 0, superseded: 0 });
      expect(project.designCount).toBe(1);
      const forBuyer = (await t.http().get('/api/projects').set(as('purchaser'))).body.find(
        (p: { id: number }) => p.id === design.projectId,
      );
      expect(forBuyer.statusCounts).toEqual({ draft: 0, in_review: 0, released: 0, superseded: 0 });
    });
  });

  describe('documents on the design page', () => {
    it('the checker gets the BOM of a design in check (marked DRAFT), not of a draft; a viewer gets the released report, not the BOM', async () => {
      const design = await createDesign(t, tokens.engineer, catalog);
      const bom = (who: string) => t.http().get(`/api/designs/${design.id}/bom.csv`).set(as(who));
      expect((await bom('checker')).status).toBe(409);
      await transition(design.id, 'engineer', { to: 'in_review' }).expect(200);
      const inCheck = await bom('checker');
      expect(inCheck.status).toBe(200);
      expect(inCheck.text.split('\n')[0]).toMatch(/^DRAFT/);
      expect((await t.http().get(`/api/designs/${design.id}/report.pdf`).set(as('checker'))).status).toBe(200);
      expect((await t.http().get(`/api/designs/${design.id}/report.pdf`).set(as('viewer'))).status).toBe(403);
      await transition(design.id, 'checker', { to: 'released' }).expect(200);
      expect((await t.http().get(`/api/designs/${design.id}/report.pdf`).set(as('viewer'))).status).toBe(200);
      expect((await bom('viewer')).status).toBe(403);
    });
  });

  describe('requests for quotation', () => {
    let released: { id: number; name: string };
    beforeAll(async () => {
      released = await createDesign(t, tokens.engineer, catalog);
      await releaseDesign(t, released.id, tokens.engineer, tokens.checker);
    });

    it('a preview shows the recipient, text, lines for the machines asked and the attachments, and records nothing', async () => {
      const before = (await t.http().get(`/api/designs/${released.id}/rfqs`).set(as('purchaser'))).body.length;
      const sentBefore = mails().length;
      const preview = await t
        .http()
        .post(`/api/designs/${released.id}/rfqs/preview`)
        .set(as('purchaser'))
        .send({ supplierId: catalog.supplier.id, machineCount: 3, message: 'Three skids.' });
      expect(preview.status).toBe(200);
      expect(preview.body).toMatchObject({
        supplier: { id: catalog.supplier.id },
        to: 'quotes@handoff-springs.invalid',
        replyTo: 'buyer@tacet.test',
        machineCount: 3,
        lines: [{ partNumber: catalog.partNumber, quantityPerMachine: 4, quantity: 12, mountPoints: ['A', 'B', 'C', 'D'] }],
      });
      expect(preview.body.text).toContain('for 3 identical machines');
      expect(preview.body.attachments.map((a: { filename: string }) => a.filename.split('-rev1-')[1])).toEqual([
        'quote-list.csv',
        'quote-list.xlsx',
        'report.pdf',
      ]);
      expect(preview.body.attachments.every((a: { size: number }) => a.size > 0)).toBe(true);
      expect((await t.http().get(`/api/designs/${released.id}/rfqs`).set(as('purchaser'))).body).toHaveLength(before);
      expect(mails().length).toBe(sentBefore);
      expect(
        (await t.http().post(`/api/designs/${released.id}/rfqs/preview`).set(as('engineer')).send({ supplierId: catalog.supplier.id }))
          .status,
      ).toBe(403);
      expect(
        (
          await t
            .http()
            .post(`/api/designs/${released.id}/rfqs/preview`)
            .set(as('purchaser'))
            .send({ supplierId: catalog.supplier.id, machineCount: 0 })
        ).status,
      ).toBe(400);
    });

    it('sends a supplier pack without any price of ours: not in the CSV, the XLSX, the PDF or the text', async () => {
      const created = await t
        .http()
        .post(`/api/designs/${released.id}/rfqs`)
        .set(as('purchaser'))
        .send({ supplierId: catalog.supplier.id, machineCount: 2 });
      expect(created.status).toBe(201);
      expect(created.body).toMatchObject({ machineCount: 2, lines: [{ quantityPerMachine: 4, quantity: 8, unitPrice: null }] });
      const mail = mails().find((m) => m.messageId === created.body.messageId)!;
      expect(mail.text).toContain(`quoting reference RFQ-${created.body.id}`);
      expect(mail.text).toContain(`- ${catalog.partNumber}: 8 pcs (4 per machine; mount points A, B, C, D)`);

      const ours = ['987.65', '987,65', '3950.6', '3,950.60', '3950,60', '7901.2', '7,901.20'];
      const csv = mail.attachments.find((a) => a.filename.endsWith('.csv'))!;
      // the list, then the cautions a supplier gets (one cell each)
      const all = parse(csv.content, { relax_column_count: true }) as string[][];
      const rows = all.filter((row) => row.length > 1);
      expect(all.filter((row) => row.length === 1).map((row) => row[0])).toEqual(cautionLines('supplier'));
      expect(rows[0]).toEqual(['supplier', 'part_number', 'quantity', 'quantity_per_machine', 'machines', 'mount_points']);
      expect(rows[1]).toEqual([catalog.supplier.name, catalog.partNumber, '8', '4', '2', 'A B C D']);
      const workbook = new ExcelJS.Workbook();
      await workbook.xlsx.load(mail.attachments.find((a) => a.filename.endsWith('.xlsx'))!.content as unknown as ArrayBuffer);
      const cells: string[] = [];
      workbook.eachSheet((sheet) => sheet.eachRow((row) => row.eachCell((cell) => cells.push(String(cell.value)))));
      expect(cells).toContain(catalog.partNumber);
      const pdf = inflatePdf(mail.attachments.find((a) => a.filename.endsWith('.pdf'))!.content);
      expect(pdfHasText(pdf, `${catalog.partNumber} × 4`)).toBe(true); // the text is read back at all
      expect(pdfHasText(pdf, 'this request is for 2 identical machines')).toBe(true);
      const texts = [mail.text, mail.subject, csv.content.toString('utf8'), cells.join(' '), ...pdfTexts(pdf)];
      for (const text of texts) {
        for (const price of ours) expect(text).not.toContain(price);
        expect(text).not.toMatch(/unit_price|extended|\d USD|USD \d|lead time \d/i);
      }
      // our own BOM export still carries the prices
      const own = await t.http().get(`/api/designs/${released.id}/bom.csv`).set(as('purchaser'));
      expect(own.text).toContain('987.65');

      // the purchaser gets a copy with a link to follow it up
      const copy = mailTo('buyer@tacet.test', `Sent: RFQ-${created.body.id}`);
      expect(copy[0].text).toContain(`${PUBLIC_URL}/purchasing/designs/${released.id}`);
    });

    it('records a quote per line with reference and validity; the queue shows what is quoted and, once ordered, when it is due', async () => {
      const created = (
        await t
          .http()
          .post(`/api/designs/${released.id}/rfqs`)
          .set(as('purchaser'))
          .send({ supplierId: catalog.supplier.id, machineCount: 2 })
      ).body;
      const patch = (body: object) => t.http().patch(`/api/rfqs/${created.id}`).set(as('purchaser')).send(body);
      const lineId = created.lines[0].id;
      expect((await patch({ status: 'quoted', lines: [] })).body.errors).toEqual([
        { field: 'lines', message: 'A quote needs a unit price for every line of the request' },
      ]);
      expect((await patch({ status: 'quoted', lines: [{ lineId: 999999, unitPrice: 1 }] })).status).toBe(400);
      expect((await patch({ status: 'quoted', lines: [{ lineId, unitPrice: 1 }], validUntil: '30/06/2026' })).status).toBe(400);
      expect((await patch({ status: 'ordered', reference: 'Q-1' })).status).toBe(400);
      const quoted = await patch({
        status: 'quoted',
        lines: [{ lineId, unitPrice: 910.5, leadTimeDays: 28 }],
        reference: 'AS-Q-2291',
        validUntil: '2026-09-30',
      });
      expect(quoted.status).toBe(200);
      expect(quoted.body).toMatchObject({
        status: 'quoted',
        quotedPrice: 7284, // 8 × 910.50
        quoteCurrency: 'USD',
        quoteReference: 'AS-Q-2291',
        quoteValidUntil: '2026-09-30',
        lines: [{ id: lineId, unitPrice: 910.5, leadTimeDays: 28, quantity: 8 }],
        dueBy: null,
      });
      const queue = async () =>
        (await t.http().get('/api/purchasing/designs').set(as('purchaser'))).body
          .find((d: { designId: number }) => d.designId === released.id)
          .openRequests.find((r: { rfqId: number }) => r.rfqId === created.id);
      expect(await queue()).toMatchObject({
        status: 'quoted',
        quotedPrice: 7284,
        quoteReference: 'AS-Q-2291',
        quoteValidUntil: '2026-09-30',
      });
      const ordered = await patch({ status: 'ordered' });
      const due = new Date(Date.parse(ordered.body.orderedAt) + 28 * 86_400_000).toISOString().slice(0, 10);
      expect(ordered.body.dueBy).toBe(due);
      expect(await queue()).toMatchObject({ status: 'ordered', dueBy: due });
      await patch({ status: 'received' }).expect(200);
      expect(await queue()).toBeUndefined();
    });
  });

  describe('passwords', () => {
    it('an admin sets a temporary password; its owner must choose a new one before doing anything else', async () => {
      const created = await t
        .http()
        .post('/api/users')
        .set(as('admin'))
        .send({ email: 'tempo@example.test', name: 'Tess Tempo', role: 'engineer', password: 'first password 1' })
        .expect(201);
      expect(
        (await t.http().post(`/api/users/${created.body.id}/temporary-password`).set(as('engineer')).send({ password: 'temporary pass 1' }))
          .status,
      ).toBe(403);
      const set = await t
        .http()
        .post(`/api/users/${created.body.id}/temporary-password`)
        .set(as('admin'))
        .send({ password: 'temporary pass 1' });
      expect(set.status).toBe(200);
      expect(set.body.mustChangePassword).toBe(true);
      expect((await t.http().post('/api/auth/login').send({ email: 'tempo@example.test', password: 'first password 1' })).status).toBe(401);
      const login = await t.http().post('/api/auth/login').send({ email: 'tempo@example.test', password: 'temporary pass 1' });
      expect(login.status).toBe(200);
      expect(login.body.user.mustChangePassword).toBe(true);
      const auth = { Authorization: `Bearer ${login.body.accessToken}` };
      const blocked = await t.http().get('/api/projects').set(auth);
      expect(blocked.status).toBe(403);
      expect(blocked.body.message).toBe('You signed in with a temporary password: choose a new password before you go on');
      expect((await t.http().get('/api/my-work').set(auth)).status).toBe(403);
      expect((await t.http().get('/api/auth/me').set(auth)).body.mustChangePassword).toBe(true);
      expect(
        (
          await t
            .http()
            .post('/api/auth/me/password')
            .set(auth)
            .send({ currentPassword: 'temporary pass 1', newPassword: 'temporary pass 1' })
        ).status,
      ).toBe(400);
      await t
        .http()
        .post('/api/auth/me/password')
        .set(auth)
        .send({ currentPassword: 'temporary pass 1', newPassword: 'my own password 1' })
        .expect(204);
      expect((await t.http().get('/api/projects').set(auth)).status).toBe(200);
      const again = await t.http().post('/api/auth/login').send({ email: 'tempo@example.test', password: 'my own password 1' });
      expect(again.body.user.mustChangePassword).toBe(false);
    });

    it('forgot password: the same answer for any address; a mailed one-time link that expires; only a hash is stored', async () => {
      await t
        .http()
        .post('/api/users')
        .set(as('admin'))
        .send({ email: 'forgetful@example.test', name: 'Fern Forgetful', role: 'viewer', password: 'old password 11' })
        .expect(201);
      const known = await t.http().post('/api/auth/password-reset').send({ email: ' Forgetful@Example.TEST ' });
      const unknown = await t.http().post('/api/auth/password-reset').send({ email: 'nobody-here@example.test' });
      expect(known.status).toBe(202);
      expect(unknown.status).toBe(202);
      expect(unknown.body).toEqual(known.body);
      expect(known.body.message).toMatch(/^If an account uses this address/);
      expect((await t.http().post('/api/auth/password-reset').send({ email: 'not an address' })).status).toBe(400);

      const mail = await waitFor(() => mailTo('forgetful@example.test', 'Choose a new Tacet password')[0]);
      expect(mails().some((m) => m.to.includes('nobody-here@example.test'))).toBe(false);
      const link = /https:\/\/\S+\/reset-password\?token=(\S+)/.exec(mail.text);
      expect(link![0].startsWith(`${PUBLIC_URL}/reset-password?token=`)).toBe(true);
      const token = decodeURIComponent(link![1]);

      const stored = await t.app.get(DataSource).getRepository(PasswordResetToken).find();
      expect(stored.map((row) => row.tokenHash)).toContain(hashToken(token));
      expect(JSON.stringify(stored)).not.toContain(token);

      expect((await t.http().post('/api/auth/password-reset/confirm').send({ token, password: 'short' })).status).toBe(400);
      const done = await t.http().post('/api/auth/password-reset/confirm').send({ token, password: 'new password 11' });
      expect(done.status).toBe(200);
      await t.login('forgetful@example.test', 'new password 11');
      expect((await t.http().post('/api/auth/login').send({ email: 'forgetful@example.test', password: 'old password 11' })).status).toBe(
        401,
      );
      const reused = await t.http().post('/api/auth/password-reset/confirm').send({ token, password: 'third password 11' });
      expect(reused.status).toBe(400);
      expect(reused.body.message).toMatch(/used or has expired/);
      expect(
        (await t.http().post('/api/auth/password-reset/confirm').send({ token: 'made-up', password: 'third password 11' })).status,
      ).toBe(400);
    });

    it('a link older than an hour is refused, and a newer request replaces the older link', async () => {
      const repo = t.app.get(DataSource).getRepository(PasswordResetToken);
      const tokenFor = async () => {
        const count = mailTo('forgetful@example.test', 'Choose a new Tacet password').length;
        await t.http().post('/api/auth/password-reset').send({ email: 'forgetful@example.test' }).expect(202);
        const mail = await waitFor(() => mailTo('forgetful@example.test', 'Choose a new Tacet password')[count]);
        return decodeURIComponent(/token=(\S+)/.exec(mail.text)![1]);
      };
      const first = await tokenFor();
      const second = await tokenFor();
      expect((await t.http().post('/api/auth/password-reset/confirm').send({ token: first, password: 'another password 1' })).status).toBe(
        400,
      );
      await repo.update({ tokenHash: hashToken(second) }, { expiresAt: new Date(Date.now() - 1000) });
      const expired = await t.http().post('/api/auth/password-reset/confirm').send({ token: second, password: 'another password 1' });
      expect(expired.status).toBe(400);
      expect(expired.body.message).toMatch(/used or has expired/);
      await t.login('forgetful@example.test', 'new password 11');
    });
  });

  describe('catalog import preview', () => {
    it('names the suppliers a file would create, with a similar existing name for a likely typo', async () => {
      const csv = [
        'supplier,part_number,mount_type,rated_load_n,vertical_stiffness_n_per_mm,damping_ratio',
        `${catalog.supplier.name.replace('Mounts', 'Mounst')},TYPO-1,open_spring,1000,100,0.05`,
        'Entirely New Mounting Co,NEW-1,open_spring,1000,100,0.05',
        'Entirely New Mounting Co,NEW-2,open_spring,1200,100,0.05',
        `${catalog.supplier.name},OK-1,open_spring,1000,100,0.05`,
      ].join('\n');
      const response = await t
        .http()
        .post('/api/mounts/import?dryRun=true')
        .set(as('catalog_manager'))
        .attach('file', Buffer.from(csv), 'typo.csv');
      expect(response.status).toBe(200);
      expect(response.body.newSuppliers).toEqual([
        { name: catalog.supplier.name.replace('Mounts', 'Mounst'), firstRow: 2, rows: 1, similarTo: catalog.supplier.name },
        { name: 'Entirely New Mounting Co', firstRow: 3, rows: 2, similarTo: null },
      ]);
      const suppliers = (await t.http().get('/api/suppliers').set(as('catalog_manager'))).body;
      expect(suppliers.some((s: { name: string }) => s.name === 'Entirely New Mounting Co')).toBe(false);
    });
  });
});
