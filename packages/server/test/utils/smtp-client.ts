import { connect, createServer, type AddressInfo } from 'node:net';

/**
 * A bare SMTP client over a TCP socket (RFC 5321 dialogue, no library), so tests can show
 * that the mail catcher speaks SMTP itself rather than trusting the client under test.
 * Sends each command after the previous reply is complete and returns every reply, the
 * server's greeting first. For `DATA`, pass the message (headers, blank line, body) ending in
 * a line with a single dot as the next command.
 */
export function smtpDialogue(port: number, commands: readonly string[], host = '127.0.0.1'): Promise<string[]> {
  return new Promise((resolve, reject) => {
    const socket = connect(port, host);
    const replies: string[] = [];
    let buffer = '';
    let next = 0;
    socket.setEncoding('utf8');
    socket.on('data', (chunk: string) => {
      buffer += chunk;
      // A reply is complete at a line "NNN text" (a hyphen after the code means more lines follow).
      if (!/(?:^|\r\n)\d{3} [^\r\n]*\r\n$/.test(buffer)) return;
      replies.push(buffer.trimEnd());
      buffer = '';
      if (next < commands.length) socket.write(`${commands[next++]}\r\n`);
      else socket.end();
    });
    socket.on('error', reject);
    socket.on('close', () => resolve(replies));
  });
}

/** A loopback port that nothing listens on (it was just free and is closed again). */
export async function closedLoopbackPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(0, '127.0.0.1', resolve);
  });
  const { port } = server.address() as AddressInfo;
  await new Promise<void>((resolve) => server.close(() => resolve()));
  return port;
}

/** Whether a TCP connection to the port is refused (nothing listens there). */
export function connectionRefused(port: number, host = '127.0.0.1'): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = connect(port, host);
    socket.once('connect', () => {
      socket.destroy();
      resolve(false);
    });
    socket.once('error', (error: NodeJS.ErrnoException) => resolve(error.code === 'ECONNREFUSED'));
  });
}
