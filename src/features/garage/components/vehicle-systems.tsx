import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import type { AssemblyProgress, GarageVehicleDetail } from '../api/garage-schemas';
import { ProgressBar } from './progress-bar';

type Node = AssemblyProgress & { children: Node[] };

function tree(assemblies: AssemblyProgress[]): Node[] {
  const nodes = new Map(assemblies.map((a) => [a.id, { ...a, children: [] as Node[] }]));
  const roots: Node[] = [];
  for (const n of nodes.values()) {
    const parent = n.parentId ? nodes.get(n.parentId) : undefined;
    if (parent) parent.children.push(n);
    else roots.push(n);
  }
  return roots;
}

function AssemblyRow({ vehicleId, node, depth }: { vehicleId: string; node: Node; depth: number }) {
  return (
    <li>
      <div className="grid grid-cols-[minmax(0,1fr)_8rem] items-center gap-3 py-1.5" style={{ paddingLeft: `${depth * 1.25}rem` }}>
        <Link to={paths.garageAssembly.getHref(vehicleId, node.id)} className="truncate text-sm font-medium text-patina-700 hover:underline">
          {node.name}
        </Link>
        <ProgressBar label={`Progress of ${node.name}`} progress={node.progress} size="sm" />
      </div>
      {node.children.length ? (
        <ul>
          {node.children.map((c) => (
            <AssemblyRow key={c.id} vehicleId={vehicleId} node={c} depth={depth + 1} />
          ))}
        </ul>
      ) : null}
    </li>
  );
}

/** Every system of the vehicle with its assemblies, each linking to its teardown checklist. */
export function VehicleSystems({ detail }: { detail: GarageVehicleDetail }) {
  return (
    <div className="grid gap-4 lg:grid-cols-2">
      {detail.systems.map((s) => (
        <section key={s.slug} aria-labelledby={`sys-${s.slug}`} className="rounded-card border border-rule bg-paper-raised p-4 shadow-card">
          <div className="mb-2 grid grid-cols-[minmax(0,1fr)_8rem] items-start gap-3 border-b border-rule pb-2">
            <h3 id={`sys-${s.slug}`} className="text-base font-semibold text-ink">
              {s.name}
            </h3>
            <ProgressBar label={`Progress of ${s.name}`} progress={s.progress} size="sm" />
          </div>
          <ul>
            {tree(s.assemblies).map((n) => (
              <AssemblyRow key={n.id} vehicleId={detail.vehicle.id} node={n} depth={0} />
            ))}
          </ul>
        </section>
      ))}
    </div>
  );
}
