import { simpleParser, type ParsedMail } from 'mailparser';
import { expect } from 'vitest';

/** Reads the local mail sink (maildev) over its REST API; mails are parsed from raw with mailparser. */
const base = () => process.env.MAILDEV_API ?? 'http://127.0.0.1:1080';

interface MaildevMail {
  id: string;
  to: { address: string }[];
  subject: string;
  date: string;
}

export async function mailsTo(address: string): Promise<ParsedMail[]> {
  const res = await fetch(`${base()}/api/email`);
  if (!res.ok) throw new Error(`mail sink answered ${res.status}`);
  const list = (await res.json()) as MaildevMail[];
  const mine = list.filter((m) => m.to.some((t) => t.address.toLowerCase() === address.toLowerCase()));
  return Promise.all(
    mine.map(async (m) => {
      const raw = await fetch(`${base()}/api/email/${m.id}/download`);
      return simpleParser(Buffer.from(await raw.arrayBuffer()));
    }),
  );
}

/** Waits until a mail to the address matching the subject arrives. */
export async function waitForMail(address: string, subject: RegExp, timeoutMs = 10_000): Promise<ParsedMail> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const found = (await mailsTo(address)).find((m) => subject.test(m.subject ?? ''));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`no mail to ${address} matching ${subject} within ${timeoutMs} ms`);
}

/**
 * The mail's subject and text, checked to be finished words: no `{{value}}` left unfilled and no
 * catalogue key path (`mail.…`, `partnerUpdate.…`) where a sentence should be.
 */
export function readableText(mail: ParsedMail): string {
  const all = `${mail.subject ?? ''}\n${mail.text ?? ''}`;
  expect(all).not.toMatch(/\{\{|\}\}/);
  expect(all).not.toMatch(/(?<![-\w])(mail|partnerUpdate|statement)\.\w/);
  return all;
}
