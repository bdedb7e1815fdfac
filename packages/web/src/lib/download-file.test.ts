import { installFakeApi } from '@/testing/fake-api';

import { downloadFile, fileNameFromDisposition } from './download-file';
import { setToken } from './session';
import { errorMessage } from './api-errors';

describe('file downloads through the API client', () => {
  it('takes the file name the server proposes (RFC 6266), or the fallback', () => {
    expect(fileNameFromDisposition('attachment; filename="tacet-catalog-2025-03-10.csv"', 'x.csv')).toBe('tacet-catalog-2025-03-10.csv');
    expect(fileNameFromDisposition("attachment; filename=plain.csv; filename*=UTF-8''r%C3%A9sum%C3%A9.csv", 'x.csv')).toBe('résumé.csv');
    expect(fileNameFromDisposition('attachment; filename="../../etc/passwd"', 'x.csv')).toBe('passwd');
    expect(fileNameFromDisposition('attachment', 'x.csv')).toBe('x.csv');
    expect(fileNameFromDisposition(undefined, 'x.csv')).toBe('x.csv');
  });

  it('sends the sign-in token and hands the file to the browser', async () => {
    const saved: string[] = [];
    Object.defineProperty(URL, 'createObjectURL', { value: vi.fn(() => 'blob:tacet-test'), configurable: true });
    Object.defineProperty(URL, 'revokeObjectURL', { value: vi.fn(), configurable: true });
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      saved.push(`${this.download} ${this.href}`);
    });
    setToken('a-token');
    const fake = installFakeApi().on('get', '/mounts/export.csv', {
      status: 200,
      data: 'supplier,part_number\n',
      headers: { 'content-disposition': 'attachment; filename="tacet-catalog-2025-03-10.csv"' },
    });

    await expect(downloadFile('/mounts/export.csv', 'fallback.csv')).resolves.toBe('tacet-catalog-2025-03-10.csv');
    expect(fake.requests[0]?.headers.authorization).toBe('Bearer a-token');
    expect(saved).toEqual(['tacet-catalog-2025-03-10.csv blob:tacet-test']);
  });

  it('turns an error that came back as a file into words', async () => {
    installFakeApi().on('get', '/mounts/imports/9/errors.csv', {
      status: 404,
      data: new Blob([JSON.stringify({ statusCode: 404, message: 'This import has no error report' })]),
    });
    const failure = await downloadFile('/mounts/imports/9/errors.csv', 'x.csv').catch((error: unknown) => error);
    expect(errorMessage(failure)).toBe('This import has no error report.');
  });
});
