import { createDesign, createRfqCatalog, releaseDesign, type TestCatalog, type TestDesign } from './factories/review.factory.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';
import { closedLoopbackPort } from './utils/smtp-client.js';

/**
 * Mail that cannot be sent: the app's SMTP_URL points at a loopback port nobody listens on.
 * Transitions still succeed (their notices are only logged); a request for quotation is
 * recorded as failed with the reason, and a retry after the mail server is back sends it.
 */
describe('requests for quotation when mail fails (e2e)', () => {
  let t: TestApp;
  const tokens: Record<string, string> = {};
  const as = (who: string) => ({ Authorization: `Bearer ${tokens[who]}` });
  let catalog: TestCatalog;
  let design: TestDesign;

  beforeAll(async () => {
    const port = await closedLoopbackPort();
    t = await createTestApp({ env: { SMTP_URL: `smtp://127.0.0.1:${port}` } });
    for (const role of ['engineer', 'purchaser', 'catalog_manager'] as const) tokens[role] = await t.loginAs(role);
    tokens.checker = await t.login('checker@tacet.test', 'tacet-demo');
    catalog = await createRfqCatalog(t, tokens.catalog_manager, 'quotes@failing-test.invalid');
    design = await createDesign(t, tokens.engineer, catalog);
  });
  afterAll(() => t.close());

  it('a failed notice never fails the transition', async () => {
    await releaseDesign(t, design.id, tokens.engineer, tokens.checker); // throws unless both are 200
    const response = await t.http().get(`/api/designs/${design.id}`).set(as('purchaser'));
    expect(response.body.status).toBe('released');
  });

  it('a failed send is recorded as failed with the reason (201), and a retry works once mail is back', async () => {
    const created = await t.http().post(`/api/designs/${design.id}/rfqs`).set(as('purchaser')).send({ supplierId: catalog.supplier.id });
    expect(created.status).toBe(201);
    expect(created.body.status).toBe('failed');
    expect(created.body.messageId).toBeNull();
    expect(created.body.failureReason).toMatch(/ECONNREFUSED|connect/i);
    expect(created.body.history).toEqual([expect.objectContaining({ status: 'failed' })]);
    const id = created.body.id;

    // nothing can be recorded on a failed request until it is sent
    expect((await t.http().patch(`/api/rfqs/${id}`).set(as('purchaser')).send({ status: 'ordered' })).status).toBe(409);

    // still failing: stays failed
    const again = await t.http().post(`/api/rfqs/${id}/retry`).set(as('purchaser'));
    expect(again.status).toBe(200);
    expect(again.body.status).toBe('failed');

    // the mail server is back (a stand-in for the transport that accepts the message)
    const { MailService } = await import('../src/mail/mail.service.js');
    const mail = t.app.get(MailService);
    const sent: { to: string | string[]; subject: string }[] = [];
    const original = mail.send.bind(mail);
    mail.send = async (message) => {
      sent.push(message);
      return { messageId: '<retry-test@tacet.test>' };
    };
    try {
      const retried = await t.http().post(`/api/rfqs/${id}/retry`).set(as('purchaser'));
      expect(retried.status).toBe(200);
      expect(retried.body).toMatchObject({ status: 'requested', messageId: '<retry-test@tacet.test>', failureReason: null });
      expect(retried.body.history.map((h: { status: string }) => h.status)).toEqual(['failed', 'failed', 'requested']);
      // the request to the supplier, then the purchaser's copy
      expect(sent.map((message) => message.to)).toEqual(['quotes@failing-test.invalid', 'buyer@tacet.test']);
      expect(sent[0].subject).toContain(`${design.name} rev 1`);
      expect(sent[1].subject).toBe(`Sent: RFQ-${id} to ${catalog.supplier.name}`);
    } finally {
      mail.send = original;
    }
    expect((await t.http().post(`/api/rfqs/${id}/retry`).set(as('purchaser'))).status).toBe(409);
  });
});
