import { smtpDialogue } from '../../test/utils/smtp-client.js';
import { AppConfig } from '../config/app-config.js';
import { MAIL_CATCHER_HOST, MailCatcherService } from './mail-catcher.service.js';

describe('MailCatcherService', () => {
  let catcher: MailCatcherService;
  beforeAll(async () => {
    catcher = new MailCatcherService(new AppConfig({ mailCatcher: true } as AppConfig));
    await catcher.onModuleInit();
  });
  afterAll(() => catcher.onModuleDestroy());

  it('listens on the loopback interface on a port the system chose, once', async () => {
    expect(catcher.address).toEqual({ host: MAIL_CATCHER_HOST, port: expect.any(Number) });
    expect(catcher.address!.port).toBeGreaterThan(0);
    expect(await catcher.start()).toEqual(catcher.address);
  });

  it('takes a message over a plain SMTP dialogue, without STARTTLS or authentication', async () => {
    const before = catcher.store.size;
    const replies = await smtpDialogue(catcher.address!.port, [
      'EHLO probe.example.test',
      'STARTTLS',
      'MAIL FROM:<probe@example.test>',
      'RCPT TO:<first@example.test>',
      'RCPT TO:<second@example.test>',
      'DATA',
      // No From/To headers: the store falls back to the envelope.
      ['Subject: Raw dialogue', 'Content-Type: text/plain; charset=utf-8', '', 'Line one.', '..dot-stuffed line', '.'].join('\r\n'),
      'QUIT',
    ]);
    const codes = replies.map((reply) => reply.slice(0, 3));
    expect(codes).toEqual(['220', '250', expect.stringMatching(/^50\d$/), '250', '250', '250', '354', '250', '221']);
    expect(replies[1]).not.toMatch(/STARTTLS/);

    expect(catcher.store.size).toBe(before + 1);
    expect(catcher.store.list()[0]).toMatchObject({
      from: 'probe@example.test',
      to: 'first@example.test, second@example.test',
      subject: 'Raw dialogue',
      // The dot-stuffing is undone (RFC 5321 §4.5.2).
      text: 'Line one.\n.dot-stuffed line\n',
      attachments: [],
      envelope: { mailFrom: 'probe@example.test', rcptTo: ['first@example.test', 'second@example.test'] },
    });
  });

  it('names an attachment that has no file name, and keeps its bytes', async () => {
    const boundary = 'tacet-test-boundary';
    const replies = await smtpDialogue(catcher.address!.port, [
      'HELO probe.example.test',
      'MAIL FROM:<probe@example.test>',
      'RCPT TO:<first@example.test>',
      'DATA',
      [
        'From: Probe <probe@example.test>',
        'To: First <first@example.test>',
        'Subject: Unnamed part',
        `Content-Type: multipart/mixed; boundary="${boundary}"`,
        '',
        `--${boundary}`,
        'Content-Type: text/plain',
        '',
        'See the part.',
        `--${boundary}`,
        'Content-Type: application/octet-stream',
        'Content-Disposition: attachment',
        'Content-Transfer-Encoding: base64',
        '',
        Buffer.from('0123456789').toString('base64'),
        `--${boundary}--`,
        '.',
      ].join('\r\n'),
      'QUIT',
    ]);
    expect(replies.map((reply) => reply.slice(0, 3))).toEqual(['220', '250', '250', '250', '354', '250', '221']);
    const [message] = catcher.store.list();
    expect(message).toMatchObject({ from: 'Probe <probe@example.test>', to: 'First <first@example.test>', text: 'See the part.' });
    expect(message?.attachments).toEqual([
      { filename: 'attachment-1', contentType: 'application/octet-stream', size: 10, content: Buffer.from('0123456789') },
    ]);
  });
});
