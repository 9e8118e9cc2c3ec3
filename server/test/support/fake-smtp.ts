import { createServer, type AddressInfo, type Server, type Socket } from 'node:net';

export type SmtpMode = 'accept' | 'down';

export interface FakeSmtp {
  port: number;
  /** 'down' answers every connection with 421 (RFC 5321 §4.2.3: service not available). */
  mode: SmtpMode;
  /** Recipients whose RCPT TO gets 550 (RFC 5321 §4.2.3: mailbox unavailable). */
  refuse: Set<string>;
  accepted: string[];
  close(): Promise<void>;
}

function reply(verb: string, line: string, rcpt: string[], fake: FakeSmtp): string {
  if (verb === 'EHLO' || verb === 'HELO') return '250 fake.test\r\n';
  if (verb === 'DATA') return '354 End with <CR><LF>.<CR><LF>\r\n';
  if (verb === 'QUIT') return '221 Bye\r\n';
  if (verb === 'RCPT') {
    const to = /<([^>]*)>/.exec(line)?.[1]?.toLowerCase() ?? '';
    if (fake.refuse.has(to)) return '550 5.1.1 No such mailbox\r\n';
    rcpt.push(to);
  }
  return '250 OK\r\n';
}

/** A minimal SMTP server (RFC 5321 command/reply) for the replies a real mail server gives on refusal. */
export async function startFakeSmtp(): Promise<FakeSmtp> {
  const sockets = new Set<Socket>();
  const fake: FakeSmtp = { port: 0, mode: 'accept', refuse: new Set(), accepted: [], close: async () => undefined };
  const server: Server = createServer((socket) => {
    sockets.add(socket);
    socket.on('close', () => sockets.delete(socket));
    socket.on('error', () => undefined);
    if (fake.mode === 'down') {
      socket.end('421 fake.test Service not available\r\n');
      return;
    }
    let inData = false;
    let rcpt: string[] = [];
    let buffer = '';
    socket.write('220 fake.test ESMTP\r\n');
    socket.on('data', (chunk) => {
      buffer += chunk.toString('utf8');
      if (inData) {
        if (!buffer.includes('\r\n.\r\n')) return;
        buffer = buffer.slice(buffer.indexOf('\r\n.\r\n') + 5);
        inData = false;
        fake.accepted.push(...rcpt);
        socket.write('250 OK\r\n');
      }
      let nl: number;
      while (!inData && (nl = buffer.indexOf('\r\n')) >= 0) {
        const line = buffer.slice(0, nl);
        buffer = buffer.slice(nl + 2);
        const verb = line.slice(0, 4).toUpperCase();
        if (verb === 'MAIL') rcpt = [];
        if (verb === 'DATA') inData = true;
        socket.write(reply(verb, line, rcpt, fake));
      }
    });
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  fake.port = (server.address() as AddressInfo).port;
  fake.close = () =>
    new Promise<void>((resolve) => {
      for (const s of sockets) s.destroy();
      server.close(() => resolve());
    });
  return fake;
}
