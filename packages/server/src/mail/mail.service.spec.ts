import { closedLoopbackPort, connectionRefused } from '../../test/utils/smtp-client.js';
import { AppConfig } from '../config/app-config.js';
import { MailCatcherService } from './mail-catcher.service.js';
import { MailNotConfiguredError, MailSendError } from './mail.errors.js';
import { MailService } from './mail.service.js';

type MailSettings = Pick<AppConfig, 'mailCatcher' | 'mailFrom' | 'smtpUrl'>;

/** MailService and its catcher as the module wires them, started like Nest starts them. */
async function startMail(settings: Partial<MailSettings>) {
  const config = new AppConfig({ mailCatcher: false, mailFrom: 'Tacet <no-reply@tacet.test>', ...settings } as AppConfig);
  const catcher = new MailCatcherService(config);
  const mail = new MailService(config, catcher);
  await catcher.onModuleInit();
  await mail.onModuleInit();
  const stop = async () => {
    mail.onModuleDestroy();
    await catcher.onModuleDestroy();
  };
  return { catcher, mail, stop };
}

const CSV = 'mount_point,part_number,quantity\nA1,EX-100,1\nA2,EX-100,1\n';

describe('MailService', () => {
  describe('with the local mail catcher', () => {
    let setup: Awaited<ReturnType<typeof startMail>>;
    beforeAll(async () => {
      setup = await startMail({ mailCatcher: true, mailFrom: 'Mounts desk <desk@example.test>' });
    });
    afterAll(() => setup.stop());

    it('sends from MAIL_FROM with text, HTML and attachments, and reports the Message-ID', async () => {
      const { mail, catcher } = setup;
      expect(mail.route).toBe('local-catcher');
      const sent = await mail.send({
        to: ['quotes@supplier-one.example.test', 'sales@supplier-one.example.test'],
        subject: 'Quotation request — Ø 50 mm mounts, 4 pieces',
        text: 'Please quote the attached list.\nThank you.',
        html: '<p>Please quote the attached list.</p>',
        attachments: [
          { filename: 'bom.csv', content: CSV, contentType: 'text/csv' },
          { filename: 'drawing.bin', content: Buffer.from([0, 1, 2, 254, 255]), contentType: 'application/octet-stream' },
        ],
      });
      expect(sent.messageId).toMatch(/^<.+@.+>$/);

      const [received] = catcher.store.list();
      expect(received).toMatchObject({
        messageId: sent.messageId,
        from: 'Mounts desk <desk@example.test>',
        to: 'quotes@supplier-one.example.test, sales@supplier-one.example.test',
        subject: 'Quotation request — Ø 50 mm mounts, 4 pieces',
        text: 'Please quote the attached list.\nThank you.',
        envelope: {
          mailFrom: 'desk@example.test',
          rcptTo: ['quotes@supplier-one.example.test', 'sales@supplier-one.example.test'],
        },
      });
      expect(received?.attachments.map(({ filename, contentType, size }) => ({ filename, contentType, size }))).toEqual([
        { filename: 'bom.csv', contentType: 'text/csv', size: Buffer.byteLength(CSV) },
        { filename: 'drawing.bin', contentType: 'application/octet-stream', size: 5 },
      ]);
      expect(received?.attachments[0]?.content.toString('utf8')).toBe(CSV);
      expect([...(received?.attachments[1]?.content ?? [])]).toEqual([0, 1, 2, 254, 255]);
    });

    it('rejects a message without recipients with a MailSendError naming the reason', async () => {
      const failure = await setup.mail.send({ to: [], subject: 'Nobody', text: '' }).catch((error: unknown) => error);
      expect(failure).toBeInstanceOf(MailSendError);
      expect((failure as MailSendError).reason).toMatch(/recipients/i);
    });
  });

  it('without SMTP_URL outside demo and test mode, starts no catcher and every send fails as not configured', async () => {
    const { mail, catcher, stop } = await startMail({ mailCatcher: false });
    try {
      expect(mail.route).toBe('none');
      expect(catcher.running).toBe(false);
      await expect(catcher.start()).rejects.toThrow(/only in demo and test mode/);
      const failure = await mail.send({ to: 'a@example.test', subject: 'x', text: 'y' }).catch((error: unknown) => error);
      expect(failure).toBeInstanceOf(MailNotConfiguredError);
      expect(failure).toBeInstanceOf(MailSendError);
    } finally {
      await stop();
    }
  });

  it('with SMTP_URL at a closed port, rejects with the connection failure as the reason', async () => {
    const port = await closedLoopbackPort();
    const { mail, catcher, stop } = await startMail({ smtpUrl: `smtp://127.0.0.1:${port}` });
    try {
      expect(mail.route).toBe('smtp-url');
      expect(catcher.running).toBe(false);
      const failure = await mail
        .send({ to: 'quotes@supplier-one.example.test', subject: 'RFQ', text: 'Please quote.' })
        .catch((error: unknown) => error);
      expect(failure).toBeInstanceOf(MailSendError);
      expect((failure as MailSendError).reason).toContain(`ECONNREFUSED 127.0.0.1:${port}`);
      expect((failure as MailSendError).code).toBe('ESOCKET');
    } finally {
      await stop();
    }
  });

  it('after shutdown the catcher port is closed and sending says the transport is not running', async () => {
    const { mail, catcher, stop } = await startMail({ mailCatcher: true });
    const port = catcher.address!.port;
    await stop();
    expect(catcher.running).toBe(false);
    expect(await connectionRefused(port)).toBe(true);
    await expect(mail.send({ to: 'a@example.test', subject: 'late', text: '' })).rejects.toMatchObject({
      name: 'MailSendError',
      code: 'ENOTRUNNING',
    });
  });
});
