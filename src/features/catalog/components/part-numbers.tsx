import type { PartDetail } from '../api/catalog-schemas';
import { numberKindLabel } from '../utils/catalog-format';
import { CopyButton } from './copy-button';

/** Every number the part carries, grouped by kind (maker, ordnance, NSN, standard, vendor, reproduction). */
export function PartNumbers({ groups }: { groups: PartDetail['numbers'] }) {
  if (groups.length === 0) return <p className="text-sm text-ink-muted">No numbers recorded.</p>;
  return (
    <dl className="divide-y divide-rule">
      {groups.map((g) => (
        <div key={g.kind} className="grid gap-1 py-3 sm:grid-cols-[13rem_minmax(0,1fr)] sm:gap-4">
          <dt className="text-label text-drab-700 uppercase sm:pt-2">{numberKindLabel(g.kind)}</dt>
          <dd>
            <ul className="space-y-1.5">
              {g.numbers.map((n) => (
                <li key={n.id} className="flex flex-wrap items-center gap-x-2 gap-y-0.5">
                  <span className="rounded-tag border border-rule bg-paper px-2 py-1 font-mono text-base font-semibold text-ink select-all">{n.printed}</span>
                  <CopyButton text={n.printed} label={`Copy ${n.printed}`} />
                  {n.nsn ? (
                    <span className="w-full text-xs text-ink-muted sm:w-auto">
                      FSC {n.nsn.fsc}
                      {n.nsn.supplyClass ? ` · ${n.nsn.supplyClass}` : ''}
                      {n.nsn.country ? ` · codified by ${n.nsn.country}` : ''}
                    </span>
                  ) : null}
                </li>
              ))}
            </ul>
          </dd>
        </div>
      ))}
    </dl>
  );
}
