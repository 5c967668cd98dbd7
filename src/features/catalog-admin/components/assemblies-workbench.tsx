import { Plus } from 'lucide-react';
import { useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { cn } from '@/lib/cn';
import type { AssemblyTreeNode } from '../api/admin-catalog-schemas';
import { useAssemblyRecord } from '../api/get-assembly-record';
import { useVehicleNames, useVehicleTree } from '../api/get-vehicle-trees';
import { AssemblyEditor, flattenTree } from './assembly-editor';
import { CreateAssemblyForm } from './create-assembly-form';
import { SelectField } from '@/components/ui/form-field';

/** Pick a vehicle, then an assembly from its tree (or make a new one); the choice lives in the URL. */
export function AssembliesWorkbench() {
  const [params, setParams] = useSearchParams();
  const vehicles = useVehicleNames();
  const assemblyId = params.get('assembly') ?? '';
  // A link to an assembly alone (from the data-quality report) opens its own vehicle's tree.
  const linked = useAssemblyRecord(params.get('vehicle') ? '' : assemblyId);
  const vehicleSlug = params.get('vehicle') ?? linked.data?.vehicle.slug ?? (assemblyId && linked.isPending ? '' : (vehicles.data?.[0]?.slug ?? ''));
  const tree = useVehicleTree(vehicleSlug);
  const [creating, setCreating] = useState(false);

  if (vehicles.isPending) return <PageSkeleton label="Loading vehicles" />;
  if (vehicles.isError) return <Notice tone="danger" role="alert" title={vehicles.error.message} />;
  const candidates = flattenTree(tree.data?.systems.flatMap((s) => s.assemblies) ?? []);

  return (
    <div className="grid gap-6 lg:grid-cols-[20rem_minmax(0,1fr)]">
      <div className="space-y-4">
        <SelectField label="Vehicle" value={vehicleSlug} onChange={(e) => setParams({ vehicle: e.target.value })}>
          {vehicles.data.map((v) => (
            <option key={v.slug} value={v.slug}>
              {v.name}
            </option>
          ))}
        </SelectField>
        <Button variant="secondary" size="sm" icon={<Plus aria-hidden="true" className="size-4" />} aria-expanded={creating} onClick={() => setCreating((c) => !c)}>
          New assembly
        </Button>
        {tree.isPending ? (
          <PageSkeleton label="Loading assemblies" />
        ) : tree.isError ? (
          <Notice tone="danger" role="alert" title={tree.error.message} />
        ) : (
          <nav aria-label="Assemblies" className="max-h-[70vh] space-y-4 overflow-y-auto pr-1">
            {tree.data.systems.map((s) => (
              <div key={s.slug}>
                <p className="mb-1 text-label text-drab-700 uppercase">{s.name}</p>
                <TreeLinks nodes={s.assemblies} vehicleSlug={vehicleSlug} selected={assemblyId} />
              </div>
            ))}
          </nav>
        )}
      </div>
      <div className="min-w-0">
        {creating && tree.data ? (
          <Card className="mb-6">
            <h2 className="mb-4 text-lg font-bold text-ink">New assembly for {tree.data.vehicle.name}</h2>
            <CreateAssemblyForm vehicleSlug={vehicleSlug} systems={tree.data.systems} candidates={candidates} onDone={() => setCreating(false)} />
          </Card>
        ) : null}
        {assemblyId ? (
          <AssemblyEditor key={assemblyId} assemblyId={assemblyId} candidates={candidates} />
        ) : (
          <Notice tone="info" title="Pick an assembly">
            Choose one on the left to edit it and its lines.
          </Notice>
        )}
      </div>
    </div>
  );
}

function TreeLinks({ nodes, vehicleSlug, selected }: { nodes: AssemblyTreeNode[]; vehicleSlug: string; selected: string }) {
  return (
    <ul className="space-y-0.5">
      {nodes.map((n) => (
        <li key={n.id}>
          <Link
            to={paths.admin.catalogAssemblies.getHref({ vehicle: vehicleSlug, assembly: n.id })}
            aria-current={n.id === selected ? 'page' : undefined}
            className={cn('block rounded-tag px-2 py-1 text-sm', n.id === selected ? 'bg-ink text-paper' : 'text-ink-soft hover:bg-paper-sunk hover:text-ink')}
          >
            <span className="font-mono text-xs opacity-70">{n.code}</span> {n.name}
          </Link>
          {n.children.length ? (
            <div className="ml-3 border-l border-rule pl-2">
              <TreeLinks nodes={n.children} vehicleSlug={vehicleSlug} selected={selected} />
            </div>
          ) : null}
        </li>
      ))}
    </ul>
  );
}
