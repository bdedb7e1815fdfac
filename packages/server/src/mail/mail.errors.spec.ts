import { MailNotConfiguredError, MailSendError } from './mail.errors.js';

describe('MailSendError', () => {
  it('keeps the reason, nodemailer code, SMTP reply code and the original error', () => {
    const original = Object.assign(new Error("Can't send mail - all recipients were rejected: 550 No such user"), {
      code: 'EENVELOPE',
      responseCode: 550,
    });
    const error = MailSendError.from(original);
    expect(error).toBeInstanceOf(MailSendError);
    expect(error).toMatchObject({
      name: 'MailSendError',
      reason: "Can't send mail - all recipients were rejected: 550 No such user",
      code: 'EENVELOPE',
      responseCode: 550,
      cause: original,
    });
    expect(error.message).toBe(`The e-mail could not be sent: ${original.message}`);
  });

  it('wraps things that are not errors, and passes its own errors through unchanged', () => {
    expect(MailSendError.from('socket hang up')).toMatchObject({ reason: 'socket hang up', code: undefined });
    const own = new MailNotConfiguredError();
    expect(MailSendError.from(own)).toBe(own);
  });

  it('MailNotConfiguredError is a MailSendError that says how to fix it', () => {
    const error = new MailNotConfiguredError();
    expect(error).toBeInstanceOf(MailSendError);
    expect(error.name).toBe('MailNotConfiguredError');
    expect(error.code).toBe('ENOTCONFIGURED');
    expect(error.reason).toMatch(/SMTP_URL/);
  });
});
