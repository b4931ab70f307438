import Handlebars from 'handlebars';

/** Both parts of an e-mail, made from one template: the same words, as plain text and as HTML. */
export interface RenderedMail {
  text: string;
  html: string;
}

/**
 * Two Handlebars environments over the same templates. The text one writes values as they are (plain text needs no
 * escaping); the HTML one escapes every `{{value}}`, so a customer called `<script>` is shown, never run. Templates are
 * written as plain text, paragraphs apart by a blank line; the HTML part makes each paragraph a `<p>` and each line
 * break a `<br>`. `{{link url}}` is a link in HTML and the bare address in text.
 */
const text = Handlebars.create();
const html = Handlebars.create();

const WEB_ADDRESS = /^https?:\/\/[^\s"<>]+$/i;
text.registerHelper('link', (url: unknown) => String(url ?? ''));
html.registerHelper('link', (url: unknown) => {
  const address = String(url ?? '');
  const shown = html.escapeExpression(address);
  // Only a web address becomes a link; anything else is shown as words.
  return new html.SafeString(WEB_ADDRESS.test(address) ? `<a href="${shown}">${shown}</a>` : shown);
});
/** "A, B and C". */
const listed = (items: unknown) => {
  const list = Array.isArray(items) ? items.map(String) : [];
  return list.length < 2 ? (list[0] ?? '') : `${list.slice(0, -1).join(', ')} and ${list.at(-1)}`;
};
text.registerHelper('list', listed);
html.registerHelper('list', (items: unknown) => listed(items));

const LAYOUT = html.compile(
  `<!doctype html>
<html lang="en-GB">
<head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>{{subject}}</title></head>
<body style="margin:0;padding:24px;background:#ffffff;color:#14262b;font-family:Arial,Helvetica,sans-serif;font-size:15px;line-height:1.5">
<div style="max-width:600px">
{{{body}}}
</div>
</body>
</html>
`,
  { strict: true },
);

/** Paragraphs as the text part has them, tidied: no more than one blank line between, none at either end. */
const tidy = (s: string) =>
  s
    .replace(/[ \t]+$/gm, '')
    .replace(/\n{3,}/g, '\n\n')
    .trim();

/** Registers a piece several templates share (a greeting, the contractor's sign-off), in both parts. */
export function registerMailPartial(name: string, source: string): void {
  text.registerPartial(name, source);
  html.registerPartial(name, source);
}

/** Compiles a template once; the function it gives renders both parts for a subject and the data. */
export function mailTemplate<T extends object>(source: string): (subject: string, data: T) => RenderedMail {
  const asText = text.compile<T>(source, { noEscape: true });
  const asHtml = html.compile<T>(source);
  return (subject, data) => {
    const body = tidy(asHtml(data))
      .split(/\n\n/)
      .map((paragraph) => `<p style="margin:0 0 14px">${paragraph.replace(/\n/g, '<br>\n')}</p>`)
      .join('\n');
    return { text: `${tidy(asText(data))}\n`, html: LAYOUT({ subject, body }) };
  };
}
