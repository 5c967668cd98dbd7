// Fictional demo data: invented makers, models and numbers.
import { describe, expect, it } from 'vitest';
import { brakeLayout, type BrakeDiagramKind } from './brake-layouts';
import { circle, renderDiagram, type DiagramLayout } from './svg-kit';

const layout: DiagramLayout = {
  title: 'Cup & boot <test>',
  background: '',
  items: {
    '1': { shapes: circle(100, 100, 10), anchors: [[100, 100]], bubble: [150, 80] },
    '2': { shapes: circle(200, 100, 10), anchors: [[200, 100]], bubble: [250, 80] },
    '10': { shapes: circle(300, 100, 10), anchors: [[300, 100]], bubble: [350, 80] },
  },
};

describe('renderDiagram', () => {
  it('when some callouts are used, then only those are drawn, in numeric order, with their bubble centres', () => {
    const r = renderDiagram(layout, ['10', '1', '1'], 'caption');
    expect(r.callouts).toEqual([
      { callout: '1', x: 150, y: 80 },
      { callout: '10', x: 350, y: 80 },
    ]);
    expect([...r.svg.matchAll(/data-callout="([^"]+)"/g)].map((m) => m[1])).toEqual(['1', '10']);
  });

  it('when a used callout has no drawing, then it throws naming the callout', () => {
    expect(() => renderDiagram(layout, ['1', '7'], 'caption')).toThrow(/callout\(s\) 7/);
  });

  it('when the title holds markup characters, then they are escaped', () => {
    const r = renderDiagram(layout, ['1'], 'a "quoted" caption');
    expect(r.svg).toContain('Cup &amp; boot &lt;test&gt;');
    expect(r.svg).toContain('a &quot;quoted&quot; caption');
    expect(r.svg).not.toContain('<test>');
  });

  it('when every brake layout is drawn in full, then every bubble sits inside the 800 x 600 view box', () => {
    const kinds: Array<[BrakeDiagramKind, boolean]> = [
      ['pedals', false],
      ['master_cylinder', false],
      ['front_lines', false],
      ['rear_lines', false],
      ['rear_lines', true],
      ['wheel_brake', false],
      ['wheel_cylinder', false],
      ['parking', false],
    ];
    for (const [kind, tandem] of kinds) {
      const l = brakeLayout(kind, kind, tandem);
      const r = renderDiagram(l, Object.keys(l.items), '');
      for (const c of r.callouts) expect(c.x >= 13 && c.x <= 787 && c.y >= 60 && c.y <= 587, `${kind} ${c.callout}`).toBe(true);
    }
  });
});
