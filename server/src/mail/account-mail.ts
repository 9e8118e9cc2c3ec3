import { serverWordsFor, type Language, type Words } from '@broodsilk/shared';
import type { QueuedMail } from './mail-outbox.service';

/** Whom an account e-mail goes to: the address, the name to greet (none for an address without an account) and the language to write in. */
export interface MailReader {
  email: string;
  displayName: string | null;
  language: Language;
}

/**
 * A plain-text e-mail about an account or its access, written from the catalogue's `mail` words
 * in the reader's language (`serverWordsFor`, as the statement and partner update e-mails): the
 * greeting, then one paragraph each, a blank line between.
 */
export function accountMail(to: MailReader, write: (t: Words) => { subject: string; paragraphs: string[] }): QueuedMail {
  const t = serverWordsFor(to.language);
  const { subject, paragraphs } = write(t);
  const hello = to.displayName === null ? t('mail.helloNobody') : t('mail.hello', { name: to.displayName });
  return { to: to.email, subject, text: `${[hello, ...paragraphs].join('\n\n')}\n` };
}
