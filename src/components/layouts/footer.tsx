import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';

export function Footer() {
  return (
    <footer className="mt-16 border-t border-rule bg-paper-sunk/60">
      <div className="mx-auto grid max-w-6xl gap-4 px-4 py-8 text-sm text-ink-muted sm:px-6 md:grid-cols-[1fr_2fr]">
        <div>
          <Link to={paths.home.getHref()} className="font-bold text-ink">
            Drabyard
          </Link>
          <p className="mt-1">Parts catalog and sourcing for military vehicle restorers.</p>
        </div>
        <div className="space-y-2">
          <p>Demo data in this build is fictional.</p>
          <p className="flex gap-2">
            <span aria-hidden="true" className="mt-1.5 size-2 shrink-0 rounded-full bg-warn" />
            <span>
              Brake, steering and suspension work can injure: follow local codes and have a qualified mechanic inspect
              before road use.
            </span>
          </p>
        </div>
      </div>
    </footer>
  );
}
