import Handlebars from 'handlebars';

/** One notice by e-mail (a reminder, a digest): its words, a link to what it is about, and how to stop it. */
export interface NoticeMail {
  /** The reader's language (BCP 47), for the HTML part; English unless said. */
  lang?: string;
  title: string;
  /** Paragraphs of plain text. */
  paragraphs: string[];
  link: { url: string; label: string } | null;
  why: string;
  /** None for someone without an account (nothing to unsubscribe from: the `why` says whom to ask). */
  unsubscribe: { url: string; label: string } | null;
}

// Handlebars escapes every {{value}} in the HTML part (a project title is the keeper's own text).
const html = Handlebars.compile<NoticeMail>(
  `<!doctype html>
<html lang="{{lang}}">
<head><meta charset="utf-8"><meta name="viewport" content="width=device-width"><title>{{title}}</title></head>
<body style="margin:0;padding:24px;background:#f6f5f2;font-family:system-ui,-apple-system,'Segoe UI',sans-serif;color:#1f1d1a">
  <main style="max-width:560px;margin:0 auto;background:#ffffff;border-radius:8px;padding:24px">
    <h1 style="font-size:20px;margin:0 0 16px">{{title}}</h1>
    {{#each paragraphs}}<p style="font-size:16px;line-height:1.5;margin:0 0 12px">{{this}}</p>{{/each}}
    {{#if link}}<p style="margin:20px 0"><a href="{{link.url}}" style="color:#5a3e9b">{{link.label}}</a></p>{{/if}}
    <hr style="border:none;border-top:1px solid #e3e0da;margin:24px 0 12px">
    <p style="font-size:13px;color:#57534e;margin:0 0 8px">{{why}}</p>
    {{#if unsubscribe}}<p style="font-size:13px;margin:0"><a href="{{unsubscribe.url}}" style="color:#57534e">{{unsubscribe.label}}</a></p>{{/if}}
  </main>
</body>
</html>
`,
  { strict: true },
);

// The plain-text part is not HTML: nothing to escape.
const text = Handlebars.compile<NoticeMail>(
  `{{title}}

{{#each paragraphs}}{{this}}

{{/each}}{{#if link}}{{link.label}}: {{link.url}}

{{/if}}--
{{why}}
{{#if unsubscribe}}{{unsubscribe.label}}: {{unsubscribe.url}}
{{/if}}`,
  { noEscape: true, strict: true },
);

export function renderNoticeMail(mail: NoticeMail): { html: string; text: string } {
  const full = { ...mail, lang: mail.lang ?? 'en' };
  return { html: html(full), text: text(full) };
}

/** RFC 8058 one-click unsubscribe: a List-Unsubscribe URL that takes a POST, and the header saying so. */
export function unsubscribeHeaders(url: string): Record<string, string> {
  return { 'List-Unsubscribe': `<${url}>`, 'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click' };
}
