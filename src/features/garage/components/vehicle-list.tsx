import { Truck } from 'lucide-react';
import { Link } from 'react-router-dom';
import { originalityTargetLabels } from '@shared/schemas/garage';
import { Badge } from '@/components/ui/badge';
import { paths } from '@/config/paths';
import type { GarageVehicleWithProgress } from '../api/garage-schemas';
import { vehicleTitle } from '../utils/garage-format';
import { ProgressBar } from './progress-bar';

/** The restorer's vehicles as cards, each with its overall teardown progress. */
export function VehicleList({ vehicles }: { vehicles: GarageVehicleWithProgress[] }) {
  return (
    <ul aria-label="Your vehicles" className="grid gap-4 md:grid-cols-2">
      {vehicles.map((v) => {
        const title = vehicleTitle(v);
        return (
          <li key={v.id} className="relative rounded-card border border-rule bg-paper-raised p-5 shadow-card hover:border-patina-300">
            <div className="flex items-start gap-3">
              <Truck aria-hidden="true" className="mt-1 size-5 shrink-0 text-drab-700" />
              <div className="min-w-0 flex-1">
                <h2 className="text-lg font-semibold text-ink">
                  <Link to={paths.garageVehicle.getHref(v.id)} className="after:absolute after:inset-0 hover:text-patina-700">
                    {title}
                  </Link>
                </h2>
                <p className="text-sm text-ink-soft">
                  {v.nickname ? `${v.model.name} · ` : ''}serial <span className="font-mono">{v.serial}</span>
                  {v.buildDate ? ` · built ${v.buildDate}` : ''}
                  {v.variant ? ` · ${v.variant}` : ''}
                </p>
                <Badge tone="drab" className="mt-2">
                  {originalityTargetLabels[v.originalityTarget]}
                </Badge>
              </div>
            </div>
            <div className="mt-4">
              <ProgressBar label={`Teardown progress of ${title}`} progress={v.progress} size="sm" />
            </div>
          </li>
        );
      })}
    </ul>
  );
}
