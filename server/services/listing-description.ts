/**
 * Listing descriptions: plain text or markdown, rendered once on save to sanitised HTML (the page shows the
 * stored HTML; nothing is rendered in the browser).
 *
 * Decision: raw HTML in markdown is escaped, not passed to the sanitiser, and the sanitiser then allows only
 * basic text tags: no images (a listing's pictures go through the photo pipeline), no attributes but a link's
 * href, links only to http(s) and mailto, and every link gets rel="nofollow ugc noopener".
 */
import { Marked } from 'marked';
import sanitizeHtml from 'sanitize-html';

export type DescriptionFormat = 'plain' | 'markdown';

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] as string);

const markdown = new Marked({
  async: false,
  gfm: true,
  breaks: true,
  renderer: {
    // Raw HTML blocks and inline tags are shown as text.
    html({ text }) {
      return escapeHtml(text);
    },
    // Images become their alt text: photos belong in the photo gallery.
    image({ text }) {
      return escapeHtml(text);
    },
  },
});

const SANITIZE: sanitizeHtml.IOptions = {
  allowedTags: ['p', 'br', 'strong', 'b', 'em', 'i', 'ul', 'ol', 'li', 'blockquote', 'code', 'pre', 'h3', 'h4', 'h5', 'h6', 'hr', 'a', 'del', 'table', 'thead', 'tbody', 'tr', 'th', 'td'],
  allowedAttributes: { a: ['href'] },
  allowedSchemes: ['http', 'https', 'mailto'],
  allowProtocolRelative: false,
  disallowedTagsMode: 'discard',
  // Headings in a description must not outrank the page's own: h1/h2 become h3.
  transformTags: {
    h1: 'h3',
    h2: 'h3',
    a: sanitizeHtml.simpleTransform('a', { rel: 'nofollow ugc noopener', target: '_blank' }),
  },
};
// simpleTransform adds rel/target after the attribute filter ran, so allow them on the way out only.
const SANITIZE_LINKS: sanitizeHtml.IOptions = { ...SANITIZE, allowedAttributes: { a: ['href', 'rel', 'target'] } };

/** Plain text: paragraphs at blank lines, line breaks kept, everything escaped. */
export function plainToHtml(text: string): string {
  const paragraphs = text
    .replace(/\r\n?/g, '\n')
    .split(/\n{2,}/)
    .map((p) => p.trim())
    .filter(Boolean);
  return paragraphs.map((p) => `<p>${escapeHtml(p).replace(/\n/g, '<br />')}</p>`).join('\n');
}

export function renderDescription(text: string, format: DescriptionFormat): string {
  if (format === 'plain') return plainToHtml(text);
  const html = markdown.parse(text.replace(/\r\n?/g, '\n')) as string;
  return sanitizeHtml(sanitizeHtml(html, SANITIZE), SANITIZE_LINKS).trim();
}

/**
 * The format a stored description was written in. The table keeps only the source and the HTML, so the format
 * is read back from them: plain text renders to exactly `plainToHtml(source)`. (Markdown that renders the same
 * is indistinguishable from plain text, and treating it as plain shows the seller the same result.)
 */
export function inferDescriptionFormat(source: string, html: string): DescriptionFormat {
  return plainToHtml(source) === html ? 'plain' : 'markdown';
}
