// Our exploded diagrams are our own SVG from the seed, but they are still stored text: before any of it
// reaches the page it is parsed as SVG (never as HTML) and reduced to plain drawing elements and attributes.
// Anything that can run script, load something or embed HTML (script, foreignObject, image, use, a, style,
// animation, event handlers, hrefs, inline CSS) is dropped.

const SVG_NS = 'http://www.w3.org/2000/svg';

const ALLOWED_ELEMENTS = new Set(['svg', 'g', 'rect', 'circle', 'ellipse', 'line', 'polyline', 'polygon', 'path', 'text', 'tspan']);

const ALLOWED_ATTRIBUTES = new Set([
  'viewBox', 'x', 'y', 'x1', 'y1', 'x2', 'y2', 'cx', 'cy', 'r', 'rx', 'ry', 'width', 'height', 'd', 'points', 'dx', 'dy',
  'transform', 'fill', 'fill-opacity', 'fill-rule', 'stroke', 'stroke-width', 'stroke-dasharray', 'stroke-linejoin',
  'stroke-linecap', 'stroke-opacity', 'opacity', 'font-family', 'font-size', 'font-weight', 'font-style', 'text-anchor',
  'dominant-baseline', 'letter-spacing', 'data-callout',
]);

export type ViewBox = { x: number; y: number; width: number; height: number };

export type SanitizedSvg = {
  viewBox: ViewBox;
  /** The drawing's child elements, cleaned, ready to be imported into the page's document. */
  root: Element;
};

function parseViewBox(svg: Element): ViewBox | null {
  const raw = svg.getAttribute('viewBox');
  if (raw) {
    const [x, y, width, height] = raw.trim().split(/[\s,]+/).map(Number);
    if ([x, y, width, height].every(Number.isFinite) && width > 0 && height > 0) return { x, y, width, height };
  }
  const width = Number(svg.getAttribute('width'));
  const height = Number(svg.getAttribute('height'));
  return width > 0 && height > 0 ? { x: 0, y: 0, width, height } : null;
}

function clean(element: Element) {
  for (const child of [...element.children]) {
    if (child.namespaceURI !== SVG_NS || !ALLOWED_ELEMENTS.has(child.localName) || child.localName === 'svg') {
      child.remove();
      continue;
    }
    for (const attr of [...child.attributes]) {
      const value = attr.value.toLowerCase();
      const allowed = attr.namespaceURI === null && ALLOWED_ATTRIBUTES.has(attr.name) && !value.includes('url(') && !value.includes('javascript:');
      if (!allowed) child.removeAttributeNode(attr);
    }
    clean(child);
  }
  // Comments and processing instructions carry nothing we draw.
  for (const node of [...element.childNodes]) {
    if (node.nodeType !== Node.ELEMENT_NODE && node.nodeType !== Node.TEXT_NODE) node.remove();
  }
}

/** Parses and cleans a diagram; null when the text is not a usable SVG drawing. */
export function sanitizeSvg(markup: string): SanitizedSvg | null {
  const doc = new DOMParser().parseFromString(markup, 'image/svg+xml');
  const root = doc.documentElement;
  if (!root || root.localName !== 'svg' || root.namespaceURI !== SVG_NS || doc.getElementsByTagName('parsererror').length > 0) return null;
  const viewBox = parseViewBox(root);
  if (!viewBox) return null;
  clean(root);
  return { viewBox, root };
}
