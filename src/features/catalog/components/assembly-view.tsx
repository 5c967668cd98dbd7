import { ArrowRight, ImageOff } from 'lucide-react';
import { useMemo, useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { ContentLayout } from '@/components/layouts/content-layout';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { fieldErrorsOf } from '@/lib/api-client';
import type { AssemblyDetail, BomLine } from '../api/catalog-schemas';
import { useAssembly } from '../api/get-assembly';
import { BomTable } from './bom-table';
import { CatalogCrumbs } from './catalog-crumbs';
import { ExcludedLines } from './excluded-lines';
import { ExplodedDiagram } from './exploded-diagram';
import { QueryProblem } from './query-problem';
import { SafetyCautions } from './safety-cautions';
import { SerialFilter } from './serial-filter';

/** An assembly: exploded diagram and parts list side by side, linked both ways, filtered by ?serial=. */
export function AssemblyView({ id }: { id: string }) {
  const [searchParams, setSearchParams] = useSearchParams();
  const serial = searchParams.get('serial')?.trim() || null;
  const query = useAssembly(id, { serial });

  const applySerial = (value: string | null) =>
    setSearchParams(
      (prev) => {
        const next = new URLSearchParams(prev);
        if (value) next.set('serial', value);
        else next.delete('serial');
        return next;
      },
      { replace: false },
    );

  if (query.isPending) return <PageSkeleton label="Loading the assembly" />;
  if (query.isError) {
    const serialError = fieldErrorsOf(query.error).serial?.[0];
    if (serialError) {
      return (
        <ContentLayout title="Assembly" eyebrow="Catalog">
          <div className="space-y-4">
            <SerialFilter serial={serial} onApply={applySerial} serverError={serialError} />
          </div>
        </ContentLayout>
      );
    }
    return (
      <ContentLayout title="Assembly" eyebrow="Catalog">
        <QueryProblem error={query.error} what="assembly" onRetry={() => void query.refetch()} />
      </ContentLayout>
    );
  }
  return <AssemblyPage key={query.data.assembly.id} data={query.data} serial={serial} onSerial={applySerial} updating={query.isPlaceholderData} />;
}

function AssemblyPage({ data, serial, onSerial, updating }: { data: AssemblyDetail; serial: string | null; onSerial: (s: string | null) => void; updating: boolean }) {
  const [highlighted, setHighlighted] = useState<string | null>(null);
  const [selected, setSelected] = useState<string | null>(null);
  const { assembly, vehicle, system, lines } = data;

  const byCallout = useMemo(() => {
    const m = new Map<string, BomLine[]>();
    for (const l of lines) m.set(l.callout, [...(m.get(l.callout) ?? []), l]);
    return m;
  }, [lines]);
  const excludedNames = useMemo(() => {
    const m = new Map<string, string[]>();
    for (const { line } of data.excluded) m.set(line.callout, [...(m.get(line.callout) ?? []), line.part.name]);
    return m;
  }, [data.excluded]);

  const describe = (callout: string) => {
    const names = byCallout.get(callout)?.map((l) => l.part.name);
    if (names?.length) return names.join(' or ');
    return excludedNames.has(callout) ? `${excludedNames.get(callout)!.join(' or ')} (not on this vehicle)` : 'no line';
  };
  const toggle = (callout: string) => setSelected((s) => (s === callout ? null : callout));
  const selectedLines = selected ? (byCallout.get(selected) ?? []) : [];
  // Printed as on the data plate: prefix and digits, no grouping.
  const serialRange = `This model: serials ${vehicle.serialPrefix}${vehicle.serialFrom} to ${vehicle.serialPrefix}${vehicle.serialTo}`;
  const safetyClasses = [...new Set([...lines, ...data.excluded.map((x) => x.line)].map((l) => l.part.safetyClass).filter((c) => c !== 'none'))];

  return (
    <>
      <CatalogCrumbs
        trail={[
          { label: 'Catalog', to: paths.catalog.getHref() },
          { label: vehicle.name, to: paths.catalogVehicle.getHref(vehicle.slug) },
          ...(data.parent ? [{ label: data.parent.name, to: paths.catalogAssembly.getHref(data.parent.id, { serial }) }] : []),
          { label: assembly.name },
        ]}
      />
      <ContentLayout title={assembly.name} eyebrow={`${system.name} · ${assembly.code}`} description={assembly.description || undefined}>
        <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
          <div className="min-w-0">
            {assembly.diagramSvg ? (
              <ExplodedDiagram
                title={assembly.name}
                svg={assembly.diagramSvg}
                callouts={data.callouts}
                describeCallout={describe}
                isInactive={(c) => !byCallout.has(c)}
                highlighted={highlighted}
                selected={selected}
                onHighlight={setHighlighted}
                onSelect={toggle}
              />
            ) : (
              <div className="flex items-center gap-3 rounded-card border border-dashed border-rule-strong bg-paper-raised p-6 text-ink-soft">
                <ImageOff aria-hidden="true" className="size-6 text-drab-500" />
                No exploded diagram for this assembly yet; the parts list has every line.
              </div>
            )}
          </div>
          <div className="min-w-0 space-y-5">
            <SerialFilter serial={serial} onApply={onSerial} serialRange={serialRange} />
            {data.filter ? (
              <Notice tone="info" role="status" title={`Showing what applies to serial ${serial}`}>
                {updating
                  ? 'Updating…'
                  : `${lines.length} of ${lines.length + data.excluded.length} lines apply${data.excluded.length ? '; the rest are listed under “Not on this vehicle”.' : '.'}`}
              </Notice>
            ) : null}
            <SelectedCallout callout={selected} lines={selectedLines} excluded={selected ? (excludedNames.get(selected) ?? []) : []} />
            <SafetyCautions cautions={data.cautions} subject={`${safetyClasses.join(' and ') || system.name.toLowerCase()} parts in this assembly`} />
            {data.children.length ? (
              <section aria-labelledby="sub-assemblies">
                <h2 id="sub-assemblies" className="mb-2 text-label text-drab-700 uppercase">
                  Sub-assemblies
                </h2>
                <ul className="space-y-1">
                  {data.children.map((c) => (
                    <li key={c.id}>
                      <Link to={paths.catalogAssembly.getHref(c.id, { serial })} className="font-medium text-patina-700 hover:underline">
                        {c.name}
                      </Link>{' '}
                      <span className="font-mono text-xs text-ink-muted">{c.code}</span>
                    </li>
                  ))}
                </ul>
              </section>
            ) : null}
          </div>
        </div>

        <section aria-labelledby="parts-list" className="mt-8 space-y-4">
          <h2 id="parts-list" className="text-xl font-bold text-ink">
            Parts list
          </h2>
          <BomTable lines={lines} highlighted={highlighted} selected={selected} onHighlight={setHighlighted} onSelect={toggle} filtered={!!data.filter} />
          <ExcludedLines excluded={data.excluded} />
        </section>
      </ContentLayout>
    </>
  );
}

function SelectedCallout({ callout, lines, excluded }: { callout: string | null; lines: BomLine[]; excluded: string[] }) {
  return (
    <section aria-label="Selected callout" aria-live="polite" className="rounded-card border border-rule bg-paper-raised p-4 shadow-card">
      {callout === null ? (
        <p className="text-sm text-ink-muted">Pick a callout on the diagram or in the parts list to see its part here.</p>
      ) : (
        <>
          <p className="text-label text-drab-700 uppercase">Callout {callout}</p>
          {lines.length === 0 ? (
            <p className="mt-1 text-sm text-ink-soft">{excluded.length ? `${excluded.join(' or ')}: not on this vehicle.` : 'No line for this callout.'}</p>
          ) : (
            <ul className="mt-2 space-y-3">
              {lines.map((l) => (
                <li key={l.id}>
                  <p className="font-semibold text-ink">{l.part.name}</p>
                  <p className="text-sm text-ink-soft">
                    {l.part.primaryNumber ? <span className="font-mono">{l.part.primaryNumber}</span> : null}
                    {l.part.primaryNumber ? ' · ' : null}Qty {l.quantity}
                    {l.notes ? ` · ${l.notes}` : null}
                  </p>
                  <Link
                    to={paths.catalogPart.getHref(l.part.id)}
                    className="mt-1 inline-flex items-center gap-1 text-sm font-semibold text-patina-700 hover:underline"
                    aria-label={`Open the part page: ${l.part.name}`}
                  >
                    Open the part page <ArrowRight aria-hidden="true" className="size-4" />
                  </Link>
                </li>
              ))}
            </ul>
          )}
        </>
      )}
    </section>
  );
}
