import { describe, expect, it } from 'vitest';
import { inferDescriptionFormat, plainToHtml, renderDescription } from './listing-description';

describe('listing descriptions', () => {
  it('when plain text is rendered, then it is escaped into paragraphs and line breaks', () => {
    expect(plainToHtml('One <b>&\ntwo\n\n\nthree')).toBe('<p>One &lt;b&gt;&amp;<br />two</p>\n<p>three</p>');
  });

  it('when markdown carries raw HTML, images and script links, then none of them survive', () => {
    const html = renderDescription('# Big\n\n<iframe src="x"></iframe> ![p](http://x/p.png) [x](javascript:alert(1)) <a href="/" onclick="y">a</a>', 'markdown');
    // Raw HTML is shown as text: no real tag, handler or script link is left.
    expect(html).not.toMatch(/<(iframe|img|h1|script)|<a [^>]*onclick|href="javascript/);
    expect(html).toContain('&lt;iframe');
    expect(html).toContain('<h3>Big</h3>');
  });

  it('when a link is kept, then it gets rel nofollow and a new tab', () => {
    expect(renderDescription('[shop](https://example.test/a)', 'markdown')).toBe(
      '<p><a href="https://example.test/a" rel="nofollow ugc noopener" target="_blank">shop</a></p>',
    );
  });

  it('when the stored HTML is read back, then the format is recovered', () => {
    const md = '**bold** text';
    expect(inferDescriptionFormat(md, renderDescription(md, 'markdown'))).toBe('markdown');
    expect(inferDescriptionFormat(md, renderDescription(md, 'plain'))).toBe('plain');
  });
});
