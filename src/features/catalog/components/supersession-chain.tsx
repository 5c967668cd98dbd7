import { TriangleAlert } from 'lucide-react';
import { useId, useMemo } from 'react';
import { Link } from 'react-router-dom';
import { interchangeLabels } from '@shared/schemas/catalog';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { cn } from '@/lib/cn';
import type { ChainEdge, PartSummary, SupersessionChain as Chain } from '../api/catalog-schemas';
import { layoutChain } from '../utils/chain-layout';

const NODE_W = 196;
const NODE_H = 70;
const COL_GAP = 112;
const ROW_GAP = 22;
const PAD_X = 8;
const PAD_TOP = 30; // room for a kit's label and an edge label above the first row
const LOOP_DROP = 40; // how far below the nodes a loop's closing edge swings

const SYMBOL = { two_way: '⇄', one_way: '→', conditional: '→' } as const;
const SHORT = { two_way: 'two-way', one_way: 'one-way', conditional: 'conditional' } as const;

export type SupersessionChainProps = { chain: Chain; partId: string };

/**
 * The supersession component around a part, older parts left and newer right. Arrows carry the kind of
 * interchange (⇄ two-way, → one-way, dashed → conditional with a numbered note), kit members are boxed
 * together with their quantities, the current part is marked and loops are shown as a warning. The same
 * facts follow as a list of steps for screen readers and for copying.
 */
export function SupersessionChain({ chain, partId }: SupersessionChainProps) {
  const rawId = useId();
  const uid = rawId.replace(/[^a-zA-Z0-9]/g, '');
  const parts = useMemo(() => new Map(chain.parts.map((p) => [p.id, p])), [chain.parts]);
  const layout = useMemo(() => layoutChain(chain.parts.map((p) => p.id), chain.edges), [chain.parts, chain.edges]);
  const current = new Set(chain.current);
  // The server names parts by id in its messages; readers know them by number.
  const readable = (message: string) => chain.parts.reduce((m, p) => (p.primaryNumber ? m.replaceAll(p.id, p.primaryNumber) : m), message);
  const loops = chain.problems.filter((p) => p.kind === 'loop');
  const otherProblems = chain.problems.filter((p) => p.kind !== 'loop');

  if (chain.edges.length === 0) {
    return <p className="text-sm text-ink-soft">No supersession is recorded: this number has not been replaced and replaces no other.</p>;
  }

  // Conditional notes are numbered in the drawing and spelled out below it.
  const notes: string[] = [];
  const noteNumber = (e: ChainEdge) => {
    if (e.interchange !== 'conditional') return null;
    const text = e.note?.trim() || 'fits only with another change (no note recorded)';
    const i = notes.indexOf(text);
    if (i >= 0) return i + 1;
    notes.push(text);
    return notes.length;
  };
  const edgeNotes = new Map(chain.edges.map((e) => [e, noteNumber(e)]));

  const x = (column: number) => PAD_X + column * (NODE_W + COL_GAP);
  const y = (row: number) => PAD_TOP + row * (NODE_H + ROW_GAP);
  const width = PAD_X * 2 + layout.columns * NODE_W + Math.max(0, layout.columns - 1) * COL_GAP;
  const height = PAD_TOP + layout.rows * NODE_H + Math.max(0, layout.rows - 1) * ROW_GAP + (layout.back.length ? LOOP_DROP + 30 : 8);
  const pos = (id: string) => layout.position.get(id)!;
  const label = (p: PartSummary | undefined, id: string) => p?.primaryNumber ?? p?.name ?? id;

  const steps = [...chain.edges].sort((a, b) => pos(a.fromPartId).column - pos(b.fromPartId).column || pos(a.fromPartId).row - pos(b.fromPartId).row);

  return (
    <div className="space-y-4">
      {loops.map((p, i) => (
        <Notice key={i} tone="warn" role="alert" title="This chain loops back on itself">
          <p>{readable(p.message)} A loop is a data error: an administrator has been shown it in the data-quality report. It is drawn once, in red, and never followed round.</p>
        </Notice>
      ))}
      {otherProblems.map((p, i) => (
        <Notice key={`o${i}`} tone="warn" title="A problem in this chain">
          {readable(p.message)}
        </Notice>
      ))}

      <div className="overflow-x-auto rounded-card border border-rule bg-paper p-3" aria-hidden="true">
        <div className="relative" style={{ width, height }}>
          <svg width={width} height={height} className="absolute inset-0 overflow-visible">
            <defs>
              <marker id={`${uid}-end`} viewBox="0 0 10 10" refX="9" refY="5" markerWidth="7" markerHeight="7" orient="auto">
                <path d="M0 0 L10 5 L0 10 z" className="fill-patina-700" />
              </marker>
              <marker id={`${uid}-start`} viewBox="0 0 10 10" refX="1" refY="5" markerWidth="7" markerHeight="7" orient="auto">
                <path d="M10 0 L0 5 L10 10 z" className="fill-patina-700" />
              </marker>
              <marker id={`${uid}-loop`} viewBox="0 0 10 10" refX="9" refY="5" markerWidth="7" markerHeight="7" orient="auto">
                <path d="M0 0 L10 5 L0 10 z" className="fill-danger" />
              </marker>
            </defs>
            {layout.kits.map((kit) => {
              const rows = kit.members.map((m) => pos(m));
              if (new Set(rows.map((r) => r.column)).size !== 1) return null;
              const top = y(Math.min(...rows.map((r) => r.row))) - 20;
              const bottom = y(Math.max(...rows.map((r) => r.row))) + NODE_H + 6;
              const left = x(rows[0].column) - 6;
              return (
                <g key={kit.fromPartId}>
                  <rect x={left} y={top} width={NODE_W + 12} height={bottom - top} rx={6} className="fill-drab-100/60 stroke-drab-500" strokeDasharray="5 4" />
                  <text x={left + 8} y={top + 14} className="fill-drab-700 text-[11px] font-semibold">
                    Kit of {kit.members.length}, replaces {label(parts.get(kit.fromPartId), kit.fromPartId)}
                  </text>
                </g>
              );
            })}
            {layout.forward.map((e, i) => {
              const a = pos(e.fromPartId);
              const b = pos(e.toPartId);
              const x1 = x(a.column) + NODE_W;
              const y1 = y(a.row) + NODE_H / 2;
              const x2 = x(b.column);
              const y2 = y(b.row) + NODE_H / 2;
              const mid = (x1 + x2) / 2;
              const n = edgeNotes.get(e);
              const text = `${SYMBOL[e.interchange]} ${n ? `if ${n}` : SHORT[e.interchange]}${e.quantity > 1 ? ` ×${e.quantity}` : ''}`;
              const w = 12 + text.length * 6.6;
              // The label sits above the arrow's newer end, so labels of a kit's arrows do not pile up at the source.
              const lx = Math.max(x1 + w / 2 + 2, x2 - w / 2 - 8);
              const ly = y2 - 16;
              return (
                <g key={e.id ?? i} data-interchange={e.interchange}>
                  <path
                    d={`M${x1} ${y1} C${mid} ${y1}, ${mid} ${y2}, ${x2} ${y2}`}
                    fill="none"
                    className="stroke-patina-700"
                    strokeWidth={1.8}
                    strokeDasharray={e.interchange === 'conditional' ? '6 4' : undefined}
                    markerEnd={`url(#${uid}-end)`}
                    markerStart={e.interchange === 'two_way' ? `url(#${uid}-start)` : undefined}
                  />
                  <rect x={lx - w / 2} y={ly - 10} width={w} height={20} rx={10} className="fill-paper-raised stroke-rule-strong" />
                  <text x={lx} y={ly + 4} textAnchor="middle" className="fill-ink text-[12px] font-semibold">
                    {text}
                  </text>
                </g>
              );
            })}
            {layout.back.map((e, i) => {
              const a = pos(e.fromPartId);
              const b = pos(e.toPartId);
              const x1 = x(a.column) + NODE_W / 2;
              const x2 = x(b.column) + NODE_W / 2;
              const yb = y(Math.max(a.row, b.row)) + NODE_H;
              return (
                <g key={`back-${e.id ?? i}`} data-interchange={e.interchange} data-loop="true">
                  <path
                    d={`M${x1} ${y(a.row) + NODE_H} C${x1} ${yb + LOOP_DROP}, ${x2} ${yb + LOOP_DROP}, ${x2} ${y(b.row) + NODE_H + 2}`}
                    fill="none"
                    className="stroke-danger"
                    strokeWidth={1.8}
                    strokeDasharray="3 3"
                    markerEnd={`url(#${uid}-loop)`}
                  />
                  <text x={(x1 + x2) / 2} y={yb + LOOP_DROP * 0.75 + 16} textAnchor="middle" className="fill-danger text-[11px] font-semibold">
                    loops back
                  </text>
                </g>
              );
            })}
          </svg>
          {chain.parts.map((p) => {
            const at = pos(p.id);
            const isThis = p.id === partId;
            const isCurrent = current.has(p.id);
            return (
              <Link
                key={p.id}
                to={paths.catalogPart.getHref(p.id)}
                tabIndex={-1}
                data-part-node={p.id}
                style={{ left: x(at.column), top: y(at.row), width: NODE_W, height: NODE_H }}
                className={cn(
                  'absolute flex flex-col justify-center overflow-hidden rounded-card border px-3 py-1.5 shadow-card',
                  isThis ? 'border-2 border-patina-600 bg-patina-50' : 'border-rule-strong bg-paper-raised hover:border-patina-400',
                )}
              >
                <span className="flex items-center gap-1.5">
                  <span className="truncate font-mono text-sm font-bold text-ink">{p.primaryNumber ?? '—'}</span>
                  {isCurrent ? <span className="rounded-tag bg-ok px-1.5 text-[10px] font-bold tracking-wide text-white uppercase">Current</span> : null}
                  {isThis ? <span className="rounded-tag bg-patina-600 px-1.5 text-[10px] font-bold tracking-wide text-white uppercase">This part</span> : null}
                </span>
                <span className="line-clamp-2 text-xs leading-snug text-ink-soft">{p.name}</span>
              </Link>
            );
          })}
        </div>
      </div>

      <p className="text-xs text-ink-muted">
        Older parts on the left, newer on the right. ⇄ two-way: either part fits where the other did. → one-way: the newer part fits where the older
        did, not the reverse. Dashed → conditional: fits only with another change.
      </p>
      {notes.length ? (
        <ol className="list-decimal space-y-1 pl-6 text-sm text-ink-soft" aria-label="Conditions">
          {notes.map((n) => (
            <li key={n}>
              <span className="font-semibold text-ink">Condition:</span> {n}
            </li>
          ))}
        </ol>
      ) : null}

      <ol aria-label="Supersession steps" className="space-y-1.5 text-sm">
        {steps.map((e, i) => {
          const from = parts.get(e.fromPartId);
          const to = parts.get(e.toPartId);
          const isBack = layout.back.includes(e);
          return (
            <li key={e.id ?? i}>
              {isBack ? <TriangleAlert aria-label="Loop" className="mr-1 inline size-4 align-text-bottom text-danger" /> : null}
              <PartRef part={from} id={e.fromPartId} isThis={e.fromPartId === partId} /> <span className="text-ink-soft">is replaced by</span>{' '}
              {e.quantity > 1 ? <span className="font-semibold text-ink">{e.quantity} × </span> : null}
              <PartRef part={to} id={e.toPartId} isThis={e.toPartId === partId} />{' '}
              <span className="text-ink-soft">
                — <span className="font-semibold text-ink">{SHORT[e.interchange]}</span> {SYMBOL[e.interchange]}: {interchangeLabels[e.interchange]}
                {e.interchange === 'conditional' && e.note ? ` (${e.note})` : ''}
              </span>
            </li>
          );
        })}
      </ol>
    </div>
  );
}

function PartRef({ part, id, isThis }: { part: PartSummary | undefined; id: string; isThis: boolean }) {
  const text = part ? `${part.primaryNumber ?? ''} ${part.name}`.trim() : id;
  if (isThis) return <span className="font-semibold text-ink">{text} (this part)</span>;
  return (
    <Link to={paths.catalogPart.getHref(id)} className="font-medium text-patina-700 underline decoration-patina-300 underline-offset-3 hover:decoration-patina-600">
      {text}
    </Link>
  );
}
