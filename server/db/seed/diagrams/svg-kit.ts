// Fictional demo data: invented makers, models and numbers.
// Small SVG drawing kit for the demo exploded diagrams: plain schematic shapes, presentation attributes only
// (no <style>, no scripts, no ids, no external references), so the markup survives any sanitiser and several
// diagrams can sit on one page without id clashes.

export type Pt = readonly [number, number];

const INK = '#1f2933';
const PAPER = '#ffffff';
const STEEL = '#c9d2da';
const RUBBER = '#4a4f55';
const COPPER = '#d49a5c';
const FONT = 'sans-serif';

/** Numbers printed with at most one decimal, so the markup stays short and deterministic. */
const n = (v: number): string => (Number.isInteger(v) ? String(v) : v.toFixed(1));

function attrs(a: Record<string, string | number | undefined>): string {
  return Object.entries(a)
    .filter(([, v]) => v !== undefined)
    .map(([k, v]) => ` ${k}="${typeof v === 'number' ? n(v) : escapeXml(v as string)}"`)
    .join('');
}

export function escapeXml(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

interface Paint {
  fill?: string;
  stroke?: string;
  width?: number;
  dash?: string;
}

const paint = (p: Paint, dfl: Paint = {}) => ({
  fill: p.fill ?? dfl.fill ?? 'none',
  stroke: p.stroke ?? dfl.stroke ?? INK,
  'stroke-width': p.width ?? dfl.width ?? 1.5,
  'stroke-dasharray': p.dash ?? dfl.dash,
});

export const line = (x1: number, y1: number, x2: number, y2: number, p: Paint = {}) =>
  `<line${attrs({ x1, y1, x2, y2, ...paint(p) })}/>`;
export const rect = (x: number, y: number, w: number, h: number, p: Paint & { rx?: number } = {}) =>
  `<rect${attrs({ x, y, width: w, height: h, rx: p.rx, ...paint(p, { fill: PAPER }) })}/>`;
export const circle = (cx: number, cy: number, r: number, p: Paint = {}) =>
  `<circle${attrs({ cx, cy, r, ...paint(p, { fill: PAPER }) })}/>`;
export const ellipse = (cx: number, cy: number, rx: number, ry: number, p: Paint = {}) =>
  `<ellipse${attrs({ cx, cy, rx, ry, ...paint(p, { fill: PAPER }) })}/>`;
export const path = (d: string, p: Paint = {}) => `<path${attrs({ d, ...paint(p) })}/>`;
export const polyline = (pts: readonly Pt[], p: Paint = {}) =>
  `<polyline${attrs({ points: pts.map(([x, y]) => `${n(x)},${n(y)}`).join(' '), ...paint(p), 'stroke-linejoin': 'round' })}/>`;
export const polygon = (pts: readonly Pt[], p: Paint = {}) =>
  `<polygon${attrs({ points: pts.map(([x, y]) => `${n(x)},${n(y)}`).join(' '), ...paint(p, { fill: PAPER }) })}/>`;
export const text = (x: number, y: number, s: string, o: { size?: number; anchor?: string; weight?: string; fill?: string } = {}) =>
  `<text${attrs({ x, y, 'font-family': FONT, 'font-size': o.size ?? 12, 'text-anchor': o.anchor ?? 'start', 'font-weight': o.weight, fill: o.fill ?? INK })}>${escapeXml(s)}</text>`;

// ---- composite shapes (each returns markup; x,y is the shape's centre unless said otherwise) ----

export function hexagon(cx: number, cy: number, r: number, p: Paint = {}): string {
  const pts: Pt[] = [];
  for (let i = 0; i < 6; i++) {
    const a = (Math.PI / 3) * i + Math.PI / 6;
    pts.push([cx + r * Math.cos(a), cy + r * Math.sin(a)]);
  }
  return polygon(pts, { fill: STEEL, ...p });
}

/** Hex nut seen end-on. */
export const nut = (cx: number, cy: number, r = 11) => hexagon(cx, cy, r) + circle(cx, cy, r * 0.45);

/** Bolt seen from the side, head on the left (dir 'right') or on top (dir 'down'). */
export function bolt(x: number, y: number, len: number, dir: 'right' | 'down' = 'down'): string {
  const ticks: string[] = [];
  if (dir === 'down') {
    for (let t = y + 12 + len * 0.4; t < y + 12 + len; t += 4) ticks.push(line(x - 4, t, x + 4, t + 2, { width: 1 }));
    return rect(x - 9, y, 18, 12, { fill: STEEL }) + rect(x - 4, y + 12, 8, len) + ticks.join('');
  }
  for (let t = x + 12 + len * 0.4; t < x + 12 + len; t += 4) ticks.push(line(t, y - 4, t + 2, y + 4, { width: 1 }));
  return rect(x, y - 9, 12, 18, { fill: STEEL }) + rect(x + 12, y - 4, len, 8) + ticks.join('');
}

/** Split lock washer or plain washer, side view (a thin upright plate). */
export const washerSide = (cx: number, cy: number, h = 22, split = false) =>
  rect(cx - 2.5, cy - h / 2, 5, h, { fill: STEEL }) + (split ? line(cx - 3, cy - 2, cx + 3, cy + 2, { width: 1.2 }) : '');

/** Washer seen face-on. */
export const washerFace = (cx: number, cy: number, r = 10) => circle(cx, cy, r, { fill: STEEL }) + circle(cx, cy, r * 0.5);

/** Copper crush (sealing) washer, face-on. */
export const crushWasher = (cx: number, cy: number, r = 10) =>
  circle(cx, cy, r, { fill: COPPER }) + circle(cx, cy, r * 0.55) + circle(cx, cy, r * 0.78, { fill: 'none', width: 0.8 });

/** Cotter pin, eye on the left. */
export function cotterPin(x: number, y: number, len = 46): string {
  return (
    circle(x, y, 5, { fill: 'none', width: 2 }) +
    path(`M ${n(x + 4)} ${n(y - 3)} L ${n(x + len)} ${n(y - 3)} M ${n(x + 4)} ${n(y + 3)} L ${n(x + len - 6)} ${n(y + 3)}`, { width: 2 })
  );
}

/** Clevis pin with head on the left and a cross hole for the cotter pin. */
export const clevisPin = (x: number, y: number, len = 48) =>
  rect(x, y - 8, 6, 16, { fill: STEEL }) + rect(x + 6, y - 5, len, 10) + circle(x + len - 2, y, 2);

/** Clevis (yoke) with a threaded stub to the left. */
export function clevis(x: number, y: number): string {
  return (
    rect(x - 30, y - 4, 22, 8) +
    path(`M ${n(x - 8)} ${n(y - 14)} L ${n(x + 22)} ${n(y - 14)} L ${n(x + 22)} ${n(y - 6)} L ${n(x + 2)} ${n(y - 6)} L ${n(x + 2)} ${n(y + 6)} L ${n(x + 22)} ${n(y + 6)} L ${n(x + 22)} ${n(y + 14)} L ${n(x - 8)} ${n(y + 14)} Z`, { fill: STEEL }) +
    circle(x + 15, y - 10, 2.5) +
    circle(x + 15, y + 10, 2.5)
  );
}

/** Coil spring along x from x to x+len. */
export function spring(x: number, y: number, len: number, r = 10, coils = 7): string {
  const pts: Pt[] = [[x, y]];
  const step = len / (coils * 2);
  for (let i = 1; i < coils * 2; i++) pts.push([x + step * i, y + (i % 2 ? -r : r)]);
  pts.push([x + len, y]);
  return polyline(pts, { width: 1.8 });
}

/** Vertical coil spring from y to y+len. */
export function springV(x: number, y: number, len: number, r = 8, coils = 6): string {
  const pts: Pt[] = [[x, y]];
  const step = len / (coils * 2);
  for (let i = 1; i < coils * 2; i++) pts.push([x + (i % 2 ? -r : r), y + step * i]);
  pts.push([x, y + len]);
  return polyline(pts, { width: 1.8 });
}

/** Rubber bellows boot along x. */
export function boot(x: number, y: number, len: number, r = 18, folds = 4): string {
  const top: string[] = [];
  const bot: string[] = [];
  const step = len / (folds * 2);
  for (let i = 0; i <= folds * 2; i++) {
    const rr = i % 2 ? r : r * 0.72;
    top.push(`${n(x + step * i)} ${n(y - rr)}`);
    bot.unshift(`${n(x + step * i)} ${n(y + rr)}`);
  }
  return path(`M ${top.join(' L ')} L ${bot.join(' L ')} Z`, { fill: RUBBER, stroke: INK, width: 1.2 }) +
    line(x + len * 0.1, y, x + len * 0.9, y, { stroke: PAPER, width: 1, dash: '3 3' });
}

/** Rubber cylinder cup; the lip faces `lip`. */
export function cup(cx: number, cy: number, r = 20, lip: 'right' | 'left' = 'right'): string {
  const s = lip === 'right' ? 1 : -1;
  const x = (d: number) => n(cx + s * d);
  return path(`M ${x(-6)} ${n(cy - r)} L ${x(6)} ${n(cy - r - 3)} L ${x(2)} ${n(cy - r + 6)} L ${x(2)} ${n(cy + r - 6)} L ${x(6)} ${n(cy + r + 3)} L ${x(-6)} ${n(cy + r)} Z`, { fill: RUBBER });
}

/** Piston: short cylinder with a ring groove. */
export const piston = (cx: number, cy: number, w = 34, r = 20) =>
  rect(cx - w / 2, cy - r, w, r * 2, { fill: STEEL, rx: 3 }) + line(cx + w / 4, cy - r, cx + w / 4, cy + r, { width: 1 });

/** Cylinder casting with a bore (dashed) and an inlet boss on top at the centre. */
export function cylinderBody(cx: number, cy: number, w: number, h: number): string {
  return (
    rect(cx - w / 2, cy - h / 2, w, h, { fill: STEEL, rx: 6 }) +
    line(cx - w / 2 + 6, cy - h * 0.3, cx + w / 2 - 6, cy - h * 0.3, { dash: '5 4', width: 1 }) +
    line(cx - w / 2 + 6, cy + h * 0.3, cx + w / 2 - 6, cy + h * 0.3, { dash: '5 4', width: 1 }) +
    rect(cx - 10, cy - h / 2 - 12, 20, 12, { fill: STEEL }) +
    rect(cx - 12, cy + h / 2, 24, 10, { fill: STEEL })
  );
}

/** Master cylinder: body with the fluid reservoir cast on top. */
export function masterCylinderBody(cx: number, cy: number, w: number, h: number): string {
  return (
    rect(cx - w / 2, cy - h / 2 - 46, w * 0.72, 50, { fill: STEEL, rx: 4 }) +
    rect(cx - w / 2, cy - h / 2, w, h, { fill: STEEL, rx: 6 }) +
    line(cx - w / 2 + 8, cy, cx + w / 2 - 8, cy, { dash: '6 4', width: 1 }) +
    rect(cx - w / 2 - 14, cy - 10, 14, 20, { fill: STEEL }) +
    rect(cx - 10, cy + h / 2, 20, 12, { fill: STEEL }) + rect(cx + w / 4, cy + h / 2, 20, 12, { fill: STEEL })
  );
}

export const fillerCap = (cx: number, cy: number, w = 48) =>
  rect(cx - w / 2, cy - 8, w, 16, { fill: STEEL, rx: 4 }) + rect(cx - 6, cy + 8, 12, 10, { fill: STEEL });
export const gasketRing = (cx: number, cy: number, w = 48) => ellipse(cx, cy, w / 2, 6, { fill: '#e6dcc4' }) + ellipse(cx, cy, w / 4, 3);

/** Fitting with hex body and a tube stub to the right. */
export const fitting = (cx: number, cy: number) => hexagon(cx, cy, 11) + rect(cx + 10, cy - 4, 20, 8);
/** Bleeder screw: hex with a nipple on top. */
export const bleeder = (cx: number, cy: number) => hexagon(cx, cy, 8) + rect(cx - 3, cy - 24, 6, 16) + rect(cx - 4, cy + 8, 8, 12);
/** Rubber dust cap. */
export const dustCap = (cx: number, cy: number) => path(`M ${n(cx - 8)} ${n(cy + 6)} L ${n(cx - 8)} ${n(cy - 4)} Q ${n(cx)} ${n(cy - 14)} ${n(cx + 8)} ${n(cy - 4)} L ${n(cx + 8)} ${n(cy + 6)} Z`, { fill: RUBBER });

/** Hydraulic stop light switch: hex body, case, two terminals. */
export const stopSwitch = (cx: number, cy: number) =>
  hexagon(cx, cy, 10) + rect(cx - 12, cy - 38, 24, 28, { fill: STEEL, rx: 3 }) + rect(cx - 9, cy - 48, 4, 10) + rect(cx + 5, cy - 48, 4, 10);

/** Snap ring (open circle). */
export const snapRing = (cx: number, cy: number, r = 16) =>
  path(`M ${n(cx + r * 0.35)} ${n(cy - r * 0.94)} A ${n(r)} ${n(r)} 0 1 0 ${n(cx + r * 0.35 + 0.1)} ${n(cy + r * 0.94)}`, { width: 3 });

export const bushing = (cx: number, cy: number, w = 26, h = 22) =>
  rect(cx - w / 2, cy - h / 2, w, h, { fill: '#e8d8a8', rx: 2 }) + line(cx - w / 2, cy - h * 0.2, cx + w / 2, cy - h * 0.2, { width: 0.8 }) + line(cx - w / 2, cy + h * 0.2, cx + w / 2, cy + h * 0.2, { width: 0.8 });

export const shaft = (x: number, y: number, len: number, r = 8) => rect(x, y - r, len, r * 2, { fill: STEEL, rx: 2 }) + line(x + len - 10, y - r, x + len - 10, y + r, { width: 1 });

/** Push rod: thin rod, threaded right end. */
export function rod(x1: number, y: number, x2: number): string {
  const ticks: string[] = [];
  for (let t = x2 - 28; t < x2; t += 4) ticks.push(line(t, y - 4, t + 2, y + 4, { width: 0.8 }));
  return rect(x1, y - 3.5, x2 - x1, 7, { fill: STEEL }) + ticks.join('');
}

/** Steel brake tube (drawn double so it reads as tube, not wire). */
export const tube = (pts: readonly Pt[]) => polyline(pts, { width: 5 }) + polyline(pts, { stroke: STEEL, width: 2 });

/** Flexible hose with hex ends. */
export function hose(a: Pt, b: Pt): string {
  return (
    line(a[0], a[1], b[0], b[1], { stroke: RUBBER, width: 10 }) +
    line(a[0], a[1], b[0], b[1], { stroke: PAPER, width: 1, dash: '2 6' }) +
    hexagon(a[0], a[1], 9) +
    hexagon(b[0], b[1], 9)
  );
}

/** Brake line tee: block with three ports (left, right, down). */
export const tee = (cx: number, cy: number) =>
  rect(cx - 16, cy - 10, 32, 20, { fill: STEEL, rx: 3 }) + rect(cx - 26, cy - 5, 10, 10, { fill: STEEL }) + rect(cx + 16, cy - 5, 10, 10, { fill: STEEL }) + rect(cx - 5, cy + 10, 10, 10, { fill: STEEL }) + circle(cx, cy - 20, 4);

/** Tube clamp: single or double (two tube seats), with its screw hole. */
export function lineClamp(cx: number, cy: number, double = false): string {
  const w = double ? 34 : 22;
  return rect(cx - w / 2, cy - 7, w, 14, { fill: STEEL, rx: 5 }) + circle(cx - (double ? 8 : 0), cy, 3) + (double ? circle(cx + 8, cy, 3) : '') + circle(cx + w / 2 - 4, cy, 1.5);
}

/** Spring steel hose lock clip (U). */
export const hoseClip = (cx: number, cy: number) =>
  path(`M ${n(cx - 10)} ${n(cy - 10)} L ${n(cx - 10)} ${n(cy + 6)} Q ${n(cx)} ${n(cy + 16)} ${n(cx + 10)} ${n(cy + 6)} L ${n(cx + 10)} ${n(cy - 10)}`, { width: 3 });

/** L-shaped bracket with two holes; x,y = outer corner. */
export function bracketL(x: number, y: number, w: number, h: number): string {
  return path(`M ${n(x)} ${n(y)} L ${n(x + w)} ${n(y)} L ${n(x + w)} ${n(y + 10)} L ${n(x + 10)} ${n(y + 10)} L ${n(x + 10)} ${n(y + h)} L ${n(x)} ${n(y + h)} Z`, { fill: STEEL }) +
    circle(x + w * 0.65, y + 5, 3) + circle(x + 5, y + h * 0.65, 3);
}

/** Brake pedal: pivot hub at (x,y), arm down to the pad. */
export function pedal(x: number, y: number, padX: number, padY: number): string {
  return (
    path(`M ${n(x - 8)} ${n(y)} L ${n(padX - 6)} ${n(padY - 10)} L ${n(padX + 6)} ${n(padY - 10)} L ${n(x + 8)} ${n(y)} Z`, { fill: STEEL }) +
    circle(x, y, 16, { fill: STEEL }) + circle(x, y, 7) + circle(x + 18, y + 34, 3)
  );
}
export const pedalPad = (cx: number, cy: number) => rect(cx - 30, cy - 8, 60, 16, { fill: RUBBER, rx: 4 }) + line(cx - 24, cy, cx + 24, cy, { stroke: PAPER, width: 1, dash: '4 3' });

/** Backing plate of a drum brake seen face-on. */
export function backingPlate(cx: number, cy: number, r: number): string {
  const holes: string[] = [];
  for (let i = 0; i < 5; i++) {
    const a = (Math.PI * 2 * i) / 5;
    holes.push(circle(cx + r * 0.25 * Math.cos(a), cy + r * 0.25 * Math.sin(a), 3));
  }
  return circle(cx, cy, r, { fill: '#eef1f4' }) + circle(cx, cy, r * 0.16) + holes.join('');
}

/** Brake shoe arc (left or right half) with its lining. */
export function shoe(cx: number, cy: number, r: number, side: 'left' | 'right'): string {
  const s = side === 'left' ? -1 : 1;
  const a0 = -Math.PI / 2 + 0.35;
  const a1 = Math.PI / 2 - 0.35;
  const pt = (rr: number, a: number): string => `${n(cx + s * rr * Math.cos(a))} ${n(cy + rr * Math.sin(a))}`;
  const sweep = side === 'left' ? 0 : 1;
  const web = `M ${pt(r, a0)} A ${n(r)} ${n(r)} 0 0 ${sweep} ${pt(r, a1)} L ${pt(r - 10, a1)} A ${n(r - 10)} ${n(r - 10)} 0 0 ${1 - sweep} ${pt(r - 10, a0)} Z`;
  const lining = `M ${pt(r + 7, a0 + 0.12)} A ${n(r + 7)} ${n(r + 7)} 0 0 ${sweep} ${pt(r + 7, a1 - 0.12)} L ${pt(r, a1 - 0.12)} A ${n(r)} ${n(r)} 0 0 ${1 - sweep} ${pt(r, a0 + 0.12)} Z`;
  return path(web, { fill: STEEL }) + path(lining, { fill: '#8a6d4b' });
}

/** Brake drum face-on. */
export const drum = (cx: number, cy: number, r: number) => circle(cx, cy, r, { fill: STEEL }) + circle(cx, cy, r - 10, { fill: '#eef1f4' }) + circle(cx, cy, r * 0.3, { fill: STEEL }) + circle(cx, cy, r * 0.12);

/** Contracting band around a drum (open at the top). */
export const band = (cx: number, cy: number, r: number) =>
  path(`M ${n(cx - 12)} ${n(cy - r)} A ${n(r)} ${n(r)} 0 1 0 ${n(cx + 12)} ${n(cy - r)}`, { stroke: '#8a6d4b', width: 8 }) +
  rect(cx - 22, cy - r - 14, 10, 16, { fill: STEEL }) + rect(cx + 12, cy - r - 14, 10, 16, { fill: STEEL });

/** Lever with a hole at each end. */
export const lever = (x1: number, y1: number, x2: number, y2: number) =>
  line(x1, y1, x2, y2, { stroke: INK, width: 12 }) + line(x1, y1, x2, y2, { stroke: STEEL, width: 9 }) + circle(x1, y1, 3) + circle(x2, y2, 3);

/** T-handle of the hand brake. */
export const tHandle = (cx: number, cy: number) => rect(cx - 40, cy - 8, 80, 16, { fill: RUBBER, rx: 8 }) + rect(cx - 5, cy + 8, 10, 60, { fill: STEEL });

/** Cable inside its conduit. */
export const cable = (pts: readonly Pt[]) => polyline(pts, { width: 7, stroke: RUBBER }) + polyline(pts, { width: 1.2, stroke: PAPER, dash: '5 4' });

/** Conduit clamp (P-clip). */
export const pClip = (cx: number, cy: number) => circle(cx, cy, 9, { fill: 'none', width: 3 }) + rect(cx + 6, cy - 4, 18, 8, { fill: STEEL }) + circle(cx + 18, cy, 2);

/** Dashed outline naming a kit (the parts it holds sit inside). */
export const kitOutline = (x: number, y: number, w: number, h: number, label: string) =>
  rect(x, y, w, h, { fill: 'none', dash: '7 5', width: 1.2, rx: 8 }) + text(x + 8, y + h - 8, label, { size: 11 });

// ---- a whole diagram ----

export interface DiagramItem {
  /** Markup of the item's shapes. */
  shapes: string;
  /** Points on the shapes that the leader lines run to (one item may be drawn twice, e.g. left and right). */
  anchors: Pt[];
  /** Centre of the callout bubble. */
  bubble: Pt;
}

export interface DiagramLayout {
  title: string;
  /** Markup drawn under the items (frame rails, axes, centre lines). */
  background: string;
  items: Record<string, DiagramItem>;
}

export interface RenderedDiagram {
  svg: string;
  callouts: Array<{ callout: string; x: number; y: number }>;
}

const BUBBLE_R = 13;

const byCallout = (a: string, b: string) => Number(a) - Number(b) || a.localeCompare(b);

/**
 * Renders the items for exactly the callouts the assembly's lines use. Each callout bubble is a group with a
 * `data-callout` attribute so the page can link a bill-of-materials row to its bubble; the bubble centres come
 * back as `callouts` for the clickable overlay.
 */
export function renderDiagram(layout: DiagramLayout, used: readonly string[], caption: string): RenderedDiagram {
  const wanted = [...new Set(used)].sort(byCallout);
  const missing = wanted.filter((c) => !Object.hasOwn(layout.items, c));
  if (missing.length > 0) throw new Error(`Diagram "${layout.title}" has no drawing for callout(s) ${missing.join(', ')}.`);
  const shapes: string[] = [];
  const bubbles: string[] = [];
  const callouts: RenderedDiagram['callouts'] = [];
  for (const c of wanted) {
    const item = layout.items[c];
    shapes.push(item.shapes);
    const [bx, by] = item.bubble;
    const leaders = item.anchors.map(([ax, ay]) => {
      const d = Math.hypot(ax - bx, ay - by) || 1;
      return line(bx + ((ax - bx) / d) * BUBBLE_R, by + ((ay - by) / d) * BUBBLE_R, ax, ay, { width: 0.9 });
    });
    bubbles.push(
      `<g data-callout="${escapeXml(c)}">${leaders.join('')}${circle(bx, by, BUBBLE_R, { width: 1.4 })}${text(bx, by + 4.5, c, { size: 13, anchor: 'middle', weight: 'bold' })}</g>`,
    );
    callouts.push({ callout: c, x: bx, y: by });
  }
  const svg =
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 800 600" width="800" height="600" role="img">` +
    `<title>${escapeXml(layout.title)}</title>` +
    rect(0, 0, 800, 600, { fill: PAPER, stroke: 'none' }) +
    text(24, 34, layout.title, { size: 18, weight: 'bold' }) +
    text(24, 54, caption, { size: 12, fill: '#52606d' }) +
    text(776, 588, 'Fictional demo diagram, not to scale', { size: 10, anchor: 'end', fill: '#7b8794' }) +
    `<g>${layout.background}</g><g>${shapes.join('')}</g><g>${bubbles.join('')}</g></svg>`;
  return { svg, callouts };
}
