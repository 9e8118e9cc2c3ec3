import Handlebars from 'handlebars';

/** The small page an unsubscribe link opens in a browser: a button that POSTs (a GET changes nothing, RFC 8058 §3.2). */
export const unsubscribePage = Handlebars.compile<{ title: string; message: string; button: string | null }>(
  `<!doctype html>
<html lang="en">
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
