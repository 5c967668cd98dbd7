import { describe, expect, it } from 'vitest';
import { sanitizeSvg } from './sanitize-svg';

const wrap = (inner: string) => `<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink" viewBox="0 0 800 600">${inner}</svg>`;

describe('sanitizeSvg', () => {
  it('when the drawing holds scripts, handlers, foreignObject and links, then only the plain shapes survive', () => {
    const result = sanitizeSvg(
      wrap(
        '<script>alert(1)</script><g data-callout="3" onclick="alert(2)"><circle cx="1" cy="2" r="3" style="fill:url(http://x.example/a)"/></g>' +
          '<foreignObject><div xmlns="http://www.w3.org/1999/xhtml">hi</div></foreignObject>' +
          '<a href="https://x.example"><rect width="1" height="1"/></a><image href="https://x.example/p.png"/>' +
          '<use xlink:href="#a"/><path d="M0 0" fill="url(#g)"/>',
      ),
    );
    expect(result).not.toBeNull();
    const markup = new XMLSerializer().serializeToString(result!.root);
    expect(markup).not.toMatch(/script|onclick|foreignObject|href|image|<use|style|url\(|<a /);
    expect(result!.root.querySelector('[data-callout="3"] circle')?.getAttribute('r')).toBe('3');
  });

  it('when the viewBox is given, then it is read; when it is missing, width and height stand in', () => {
    expect(sanitizeSvg(wrap(''))!.viewBox).toEqual({ x: 0, y: 0, width: 800, height: 600 });
    expect(sanitizeSvg('<svg xmlns="http://www.w3.org/2000/svg" width="400" height="300"/>')!.viewBox).toEqual({ x: 0, y: 0, width: 400, height: 300 });
  });

  it('when the text is not SVG, then null is returned', () => {
    expect(sanitizeSvg('<html><body>no</body></html>')).toBeNull();
    expect(sanitizeSvg('<svg xmlns="http://www.w3.org/2000/svg"><g>')).toBeNull();
  });
});
