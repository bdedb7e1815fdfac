import { CAPTURED_MAIL_LIMIT, CapturedMailStore, type CapturedMail } from './captured-mail-store.js';

const message = (subject: string): Omit<CapturedMail, 'id'> => ({
  from: 'Tacet <no-reply@tacet.test>',
  to: 'someone@example.test',
  subject,
  text: '',
  receivedAt: new Date('2025-01-06T09:00:00Z'),
  attachments: [],
  envelope: { mailFrom: 'no-reply@tacet.test', rcptTo: ['someone@example.test'] },
});

describe('CapturedMailStore', () => {
  it('keeps the last 500 messages by default', () => {
    expect(CAPTURED_MAIL_LIMIT).toBe(500);
    const store = new CapturedMailStore();
    for (let i = 1; i <= 503; i++) store.add(message(`m${i}`));
    expect(store.size).toBe(500);
    expect(store.list()[0]?.subject).toBe('m503');
    expect(store.list().at(-1)?.subject).toBe('m4');
    expect(store.get(3)).toBeUndefined();
    expect(store.get(4)?.subject).toBe('m4');
  });

  it('lists newest first and never reuses an id, even after dropping or clearing', () => {
    const store = new CapturedMailStore(2);
    const ids = ['a', 'b', 'c'].map((subject) => store.add(message(subject)).id);
    expect(ids).toEqual([1, 2, 3]);
    expect(store.list().map((m) => [m.id, m.subject])).toEqual([
      [3, 'c'],
      [2, 'b'],
    ]);
    store.clear();
    expect(store.list()).toEqual([]);
    expect(store.add(message('d')).id).toBe(4);
  });

  it('refuses a limit that is not a positive integer', () => {
    expect(() => new CapturedMailStore(0)).toThrow(RangeError);
    expect(() => new CapturedMailStore(1.5)).toThrow(RangeError);
  });
});
