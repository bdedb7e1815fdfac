import { ROLES } from '../src/common/roles.js';
import { MailCatcherService } from '../src/mail/mail-catcher.service.js';
import { MailNotConfiguredError, MailSendError } from '../src/mail/mail.errors.js';
import { MailService } from '../src/mail/mail.service.js';
import { OUTBOX_UNAVAILABLE } from '../src/mail/outbox.service.js';
import { closedLoopbackPort, connectionRefused, smtpDialogue } from './utils/smtp-client.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';

const BOM_CSV = 'mount_point,supplier,part_number,quantity\r\nA1,Example Mounts Co,EX-220,1\r\nA2,Example Mounts Co,EX-220,1\r\n';

const OUTBOX_ROUTES = ['/api/outbox', '/api/outbox/1', '/api/outbox/1/attachments/0'];

/** TCP servers and sockets the process holds (Node's own resource names). */
const tcpHandles = () => process.getActiveResourcesInfo().filter((name) => name === 'TCPServerWrap' || name === 'TCPSocketWrap').length;

describe('mail and the outbox (e2e)', () => {
  let t: TestApp;
  let admin: string;
  const auth = () => ({ Authorization: `Bearer ${admin}` });

  beforeAll(async () => {
    t = await createTestApp();
    admin = await t.loginAs('admin');
  });
  afterAll(() => t.close());

  it('a message sent through MailService appears in GET /api/outbox with recipient, subject and attachment size', async () => {
    const sent = await t.app.get(MailService).send({
      to: 'quotes@supplier-one.example.test',
      subject: 'Request for quotation: demo skid, revision B',
      text: 'Please quote the mounts in the attached list.',
      attachments: [
        { filename: 'bom.csv', content: BOM_CSV, contentType: 'text/csv' },
        { filename: 'notes ø50.txt', content: 'Ø 50 mm', contentType: 'text/plain; charset=utf-8' },
      ],
    });

    const list = await t.http().get('/api/outbox').set(auth()).expect(200);
    const listed = list.body[0];
    expect(listed).toEqual({
      id: expect.any(Number),
      to: 'quotes@supplier-one.example.test',
      subject: 'Request for quotation: demo skid, revision B',
      receivedAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.\d{3}Z$/),
      attachments: [
        { filename: 'bom.csv', size: Buffer.byteLength(BOM_CSV) },
        { filename: 'notes ø50.txt', size: Buffer.byteLength('Ø 50 mm') },
      ],
    });

    const detail = await t.http().get(`/api/outbox/${listed.id}`).set(auth()).expect(200);
    expect(detail.body).toEqual({
      ...listed,
      from: 'Tacet <no-reply@tacet.test>',
      text: 'Please quote the mounts in the attached list.',
    });

    const download = (index: number) =>
      t
        .http()
        .get(`/api/outbox/${listed.id}/attachments/${index}`)
        .set(auth())
        .buffer(true)
        .parse((response, done) => {
          const chunks: Buffer[] = [];
          response.on('data', (chunk: Buffer) => chunks.push(chunk));
          response.on('end', () => done(null, Buffer.concat(chunks)));
        })
        .expect(200);
    const csv = await download(0);
    expect(csv.headers['content-type']).toBe('text/csv');
    // RFC 6266: a file name that is a plain token may go unquoted.
    expect(csv.headers['content-disposition']).toMatch(/^attachment; filename="?bom\.csv"?$/);
    expect((csv.body as Buffer).toString('utf8')).toBe(BOM_CSV);
    const notes = await download(1);
    expect(notes.headers['content-type']).toBe('text/plain; charset=utf-8');
    // RFC 6266 §4.3 / RFC 8187: an ASCII fallback plus the UTF-8 name.
    expect(notes.headers['content-disposition']).toBe(`attachment; filename="notes ?50.txt"; filename*=UTF-8''notes%20%C3%B850.txt`);
    expect((notes.body as Buffer).toString('utf8')).toBe('Ø 50 mm');

    // The catcher kept the SMTP envelope of that session and the Message-ID the sender reported.
    const captured = t.app.get(MailCatcherService).store.get(listed.id);
    expect(captured).toMatchObject({
      messageId: sent.messageId,
      envelope: { mailFrom: 'no-reply@tacet.test', rcptTo: ['quotes@supplier-one.example.test'] },
    });
  });

  it('the outbox shows what reached the catcher over SMTP from any client, newest first', async () => {
    const { port } = t.app.get(MailCatcherService).address!;
    const replies = await smtpDialogue(port, [
      'EHLO probe.example.test',
      'MAIL FROM:<probe@example.test>',
      'RCPT TO:<someone@example.test>',
      'DATA',
      ['From: Probe <probe@example.test>', 'To: someone@example.test', 'Subject: Hand-typed SMTP', '', 'Typed by hand.', '.'].join('\r\n'),
      'QUIT',
    ]);
    expect(replies.map((reply) => reply.slice(0, 3))).toEqual(['220', '250', '250', '250', '354', '250', '221']);

    const list = await t.http().get('/api/outbox').set(auth()).expect(200);
    expect(list.body[0]).toMatchObject({ to: 'someone@example.test', subject: 'Hand-typed SMTP', attachments: [] });
    expect(list.body[0].id).toBeGreaterThan(list.body[1].id);
    const detail = await t.http().get(`/api/outbox/${list.body[0].id}`).set(auth()).expect(200);
    expect(detail.body).toMatchObject({ from: 'Probe <probe@example.test>', text: 'Typed by hand.\n' });
  });

  it('answers 404 with a message for an unknown message or attachment, 400 for an id that is not a number', async () => {
    const unknown = await t.http().get('/api/outbox/999999').set(auth()).expect(404);
    expect(unknown.body).toEqual({ statusCode: 404, message: expect.stringContaining('No message 999999') });
    const [first] = (await t.http().get('/api/outbox').set(auth())).body;
    await t.http().get(`/api/outbox/${first.id}/attachments/${first.attachments.length}`).set(auth()).expect(404);
    await t.http().get('/api/outbox/abc').set(auth()).expect(400);
  });

  it('is for admins only', async () => {
    for (const role of ROLES.filter((r) => r !== 'admin')) {
      const token = await t.loginAs(role);
      for (const path of OUTBOX_ROUTES) {
        const response = await t.http().get(path).set('Authorization', `Bearer ${token}`);
        expect(`${role} ${path} → ${response.status}`).toBe(`${role} ${path} → 403`);
      }
    }
    for (const path of OUTBOX_ROUTES) await t.http().get(path).expect(401);
  });
});

describe('mail with SMTP_URL at a closed port (e2e)', () => {
  it('send rejects with a MailSendError carrying the reason, and there is no outbox', async () => {
    const port = await closedLoopbackPort();
    const t = await createTestApp({ env: { SMTP_URL: `smtp://127.0.0.1:${port}` } });
    try {
      const failure = await t.app
        .get(MailService)
        .send({ to: 'quotes@supplier-one.example.test', subject: 'RFQ', text: 'Please quote.' })
        .catch((error: unknown) => error);
      expect(failure).toBeInstanceOf(MailSendError);
      expect((failure as MailSendError).reason).toContain('ECONNREFUSED');
      expect(t.app.get(MailCatcherService).running).toBe(false);

      const admin = await t.loginAs('admin');
      const response = await t.http().get('/api/outbox').set('Authorization', `Bearer ${admin}`).expect(404);
      expect(response.body).toEqual({ statusCode: 404, message: OUTBOX_UNAVAILABLE });
    } finally {
      await t.close();
    }
  });
});

describe('mail outside demo and test mode without SMTP_URL (e2e)', () => {
  it('send fails as not configured and the outbox answers 404 in words', async () => {
    const t = await createTestApp({
      env: {
        TACET_DEMO: 'false',
        JWT_SECRET: 'an-e2e-secret-that-is-long-enough-0123456789',
        TACET_ADMIN_EMAIL: 'root@example.test',
        TACET_ADMIN_PASSWORD: 'a long admin password',
      },
    });
    try {
      await expect(
        t.app.get(MailService).send({ to: 'quotes@supplier-one.example.test', subject: 'RFQ', text: 'Please quote.' }),
      ).rejects.toBeInstanceOf(MailNotConfiguredError);
      const admin = await t.login('root@example.test', 'a long admin password');
      for (const path of OUTBOX_ROUTES) {
        const response = await t.http().get(path).set('Authorization', `Bearer ${admin}`).expect(404);
        expect(response.body).toEqual({ statusCode: 404, message: 'The outbox exists only in demo and test mode' });
      }
    } finally {
      await t.close();
    }
  });
});

/**
 * The TCP handle count once sockets being closed are gone (supertest's servers and
 * connections, a refused probe: they close a few event-loop turns later): the count when it
 * has not changed for several turns. A server or socket left open stays counted.
 */
async function settledTcpHandles(): Promise<number> {
  let count = tcpHandles();
  for (let turn = 0, same = 0; turn < 200 && same < 5; turn++) {
    await new Promise((resolve) => setImmediate(resolve));
    const now = tcpHandles();
    same = now === count ? same + 1 : 0;
    count = now;
  }
  return count;
}

describe('mail shutdown (e2e)', () => {
  it('leaves no server or socket open after app.close()', async () => {
    const before = await settledTcpHandles();
    const t = await createTestApp();
    const { port } = t.app.get(MailCatcherService).address!;
    await t.app.get(MailService).send({ to: 'someone@example.test', subject: 'Before closing', text: 'Bye.' });
    expect(tcpHandles()).toBeGreaterThan(before);
    await t.close();
    expect(await connectionRefused(port)).toBe(true);
    expect(await settledTcpHandles()).toBe(before); // the probe's own socket closes too
  });
});
