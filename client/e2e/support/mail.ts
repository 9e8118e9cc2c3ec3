import { BASE_URL } from './browser';

const MAIL_API = process.env.MAILDEV_API ?? 'http://127.0.0.1:1080';

/** The invitation link e-mailed to `address` for the project titled `title`, from the local mail sink. */
export async function invitationLink(address: string, title: string): Promise<string> {
  for (let attempt = 0; attempt < 50; attempt++) {
    const res = await fetch(`${MAIL_API}/api/email`);
    const mails = (await res.json()) as { to: { address: string }[]; subject: string; text?: string; html?: string }[];
    const mine = mails.filter((m) => m.to.some((t) => t.address === address) && `${m.subject} ${m.text ?? ''}`.includes(title));
    const body = mine.at(-1);
    const match = body && `${body.text ?? ''} ${body.html ?? ''}`.match(/\/invitations\/([A-Za-z0-9_\-.~%]+)/);
    if (match) return `${BASE_URL}/invitations/${match[1]}`;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no invitation for ${title} to ${address}`);
}

/** A message in the mail sink as its REST API gives it (maildev `GET /api/email`; header names lower-cased). */
export interface SinkMail {
  id: string;
  to: { address: string }[];
  subject: string;
  text?: string;
  html?: string;
}

/** Every message in the mail sink to `address`, oldest first. */
export async function mailsTo(address: string): Promise<SinkMail[]> {
  const mails = (await (await fetch(`${MAIL_API}/api/email`)).json()) as SinkMail[];
  return mails.filter((m) => m.to.some((t) => t.address === address));
}

/**
 * The header fields of a message as it was sent, read from its raw source (the sink's parsed
 * `headers` leave some out, e.g. List-Unsubscribe): unfolded as RFC 5322 §2.2.3 says, names lower-cased.
 */
export async function rawHeaders(id: string): Promise<Record<string, string>> {
  const source = await (await fetch(`${MAIL_API}/api/email/${encodeURIComponent(id)}/source`)).text();
  const head = source.split(/\r?\n\r?\n/)[0].replace(/\r?\n[ \t]+/g, ' ');
  const fields: Record<string, string> = {};
  for (const line of head.split(/\r?\n/)) {
    const colon = line.indexOf(':');
    if (colon > 0) fields[line.slice(0, colon).trim().toLowerCase()] = line.slice(colon + 1).trim();
  }
  return fields;
}
