import Handlebars from 'handlebars';
import { label, serverWordsFor, type Language, type NotificationKind } from '@broodsilk/shared';
import { reminderMailWords } from './reminder-words';

/** What the page says: asks before stopping, says it stopped, or says why nothing was changed. */
export type UnsubscribeStep = { step: 'ask' | 'done'; kind: NotificationKind } | { step: 'bad-link' | 'account-gone' };

/** The small page an unsubscribe link opens in a browser: a button that POSTs (a GET changes nothing, RFC 8058 §3.2). */
const page = Handlebars.compile<{ lang: Language; title: string; message: string; button: string | null }>(
  `<!doctype html>
<html lang="{{lang}}">
<head><meta charset="utf-8"><meta name="viewport" content="width=device-width"><title>{{title}}</title></head>
<body style="font-family:system-ui,sans-serif;max-width:560px;margin:48px auto;padding:0 16px;color:#1f1d1a">
  <main>
    <h1 style="font-size:22px">{{title}}</h1>
    <p>{{message}}</p>
    {{#if button}}<form method="post"><input type="hidden" name="List-Unsubscribe" value="One-Click"><button type="submit">{{button}}</button></form>{{/if}}
  </main>
</body>
</html>
`,
  { strict: true },
);

/** The page in one language: the account's for a good link, the browser's for a bad one. */
export function unsubscribePage(lang: Language, s: UnsubscribeStep): string {
  const t = serverWordsFor(lang);
  if (s.step === 'ask') {
    const kind = label(t, 'notificationKind', s.kind);
    return page({
      lang,
      title: t('reminders.unsubscribe.confirm', { kind }),
      message: reminderMailWords(lang, s.kind).why,
      button: t('reminders.unsubscribe.button'),
    });
  }
  if (s.step === 'done')
    return page({
      lang,
      title: t('reminders.unsubscribe.doneTitle'),
      message: t('reminders.unsubscribe.done', { kind: label(t, 'notificationKind', s.kind) }),
      button: null,
    });
  const message = t(s.step === 'bad-link' ? 'reminders.unsubscribe.badLink' : 'reminders.unsubscribe.accountGone');
  return page({ lang, title: t('reminders.unsubscribe.badLinkTitle'), message, button: null });
}
