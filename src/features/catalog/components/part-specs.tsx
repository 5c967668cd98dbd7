import type { PartDetail } from '../api/catalog-schemas';
import { formatGrams } from '../utils/catalog-format';

// "boreIn" -> "Bore in"; specs are free-form per category, so their keys are the only labels we have.
const specLabel = (key: string) => {
  const words = key
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .replace(/_/g, ' ')
    .toLowerCase()
    .replace(/ (in|mm|deg|tpi|psi|lb|c|f)$/, ' ($1)');
  return words[0].toUpperCase() + words.slice(1);
};

const specValue = (v: unknown): string => {
  if (v === null || v === undefined) return '—';
  if (Array.isArray(v)) return v.map(specValue).join(', ');
  if (typeof v === 'object') return JSON.stringify(v);
  if (typeof v === 'boolean') return v ? 'yes' : 'no';
  return String(v);
};

/** The part's own specifications, the figures a hardware standard gives for it (with the source), and its size. */
export function PartSpecs({ part }: { part: PartDetail['part'] }) {
  const own = Object.entries(part.specs);
  const dims = [part.lengthMm, part.widthMm, part.heightMm].some((d) => d > 0);
  return (
    <div className="space-y-5">
      {own.length || dims || part.weightGrams ? (
        <dl className="grid grid-cols-[minmax(0,11rem)_minmax(0,1fr)] gap-x-4 gap-y-1.5 text-sm">
          {own.map(([k, v]) => (
            <div key={k} className="contents">
              <dt className="text-ink-muted">{specLabel(k)}</dt>
              <dd className="text-ink">{specValue(v)}</dd>
            </div>
          ))}
          {dims ? (
            <div className="contents">
              <dt className="text-ink-muted">Size (L × W × H)</dt>
              <dd className="text-ink tabular-nums">
                {part.lengthMm} × {part.widthMm} × {part.heightMm} mm
              </dd>
            </div>
          ) : null}
          {part.weightGrams ? (
            <div className="contents">
              <dt className="text-ink-muted">Weight</dt>
              <dd className="text-ink tabular-nums">{formatGrams(part.weightGrams)}</dd>
            </div>
          ) : null}
        </dl>
      ) : (
        <p className="text-sm text-ink-muted">No specifications recorded.</p>
      )}
      {part.derivedSpecs.length ? (
        <div>
          <h3 className="mb-2 text-label text-drab-700 uppercase">From the standard</h3>
          <div className="overflow-x-auto rounded-card border border-rule">
            <table className="w-full border-collapse text-left text-sm">
              <thead className="bg-paper-sunk text-label text-ink-muted uppercase">
                <tr>
                  <th scope="col" className="px-3 py-2">Figure</th>
                  <th scope="col" className="px-3 py-2">Value</th>
                  <th scope="col" className="px-3 py-2">Source</th>
                </tr>
              </thead>
              <tbody>
                {part.derivedSpecs.map((s) => (
                  <tr key={s.key} className="border-t border-rule align-top">
                    <th scope="row" className="px-3 py-2 font-medium text-ink">
                      {s.label}
                      {s.note ? <span className="block text-xs font-normal text-ink-muted">{s.note}</span> : null}
                    </th>
                    <td className="px-3 py-2 font-mono whitespace-nowrap text-ink">{s.display}</td>
                    <td className="px-3 py-2 text-xs text-ink-soft">{s.source}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </div>
      ) : null}
    </div>
  );
}
