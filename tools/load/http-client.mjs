// @ts-check
// A small JSON client over node:http with keep-alive connections (no package needed), timing
// each request from sending to the last byte of the answer.
import http from 'node:http';
import { performance } from 'node:perf_hooks';

/**
 * @param {string} baseURL e.g. http://127.0.0.1:4000
 * @param {{ maxSockets: number }} options
 */
export function createHttpClient(baseURL, { maxSockets }) {
  const agent = new http.Agent({ keepAlive: true, maxSockets });
  const { hostname, port } = new URL(baseURL);

  /**
   * @param {string} method
   * @param {string} path
   * @param {{ token?: string, body?: unknown, timeoutMs?: number }} [options]
   * @returns {Promise<{ status: number, body: any, ms: number, at: number, newConnection: boolean }>} rejects on a
   *   transport error; `at`: when it was sent (performance.now() ms); `newConnection`: it opened a connection
   */
  function request(method, path, { token, body, timeoutMs = 60_000 } = {}) {
    const payload = body === undefined ? undefined : Buffer.from(JSON.stringify(body));
    /** @type {Record<string, string>} */
    const headers = { accept: 'application/json' };
    if (token) headers.authorization = `Bearer ${token}`;
    if (payload) {
      headers['content-type'] = 'application/json';
      headers['content-length'] = String(payload.length);
    }
    return new Promise((resolve, reject) => {
      const started = performance.now();
      const req = http.request({ host: hostname, port, method, path, headers, agent, timeout: timeoutMs }, (res) => {
        /** @type {Buffer[]} */
        const chunks = [];
        res.on('data', (chunk) => chunks.push(chunk));
        res.on('error', reject);
        res.on('end', () => {
          const ms = performance.now() - started;
          const text = Buffer.concat(chunks).toString('utf8');
          let parsed = text;
          if ((res.headers['content-type'] ?? '').includes('json') && text) {
            try {
              parsed = JSON.parse(text);
            } catch {
              // keep the text
            }
          }
          resolve({ status: res.statusCode ?? 0, body: parsed, ms, at: started, newConnection: !req.reusedSocket });
        });
      });
      req.on('timeout', () => req.destroy(new Error(`no answer within ${timeoutMs} ms`)));
      req.on('error', reject);
      req.end(payload);
    });
  }

  return { request, close: () => agent.destroy() };
}
