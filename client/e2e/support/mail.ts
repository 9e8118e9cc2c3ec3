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
