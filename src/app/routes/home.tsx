import { ArrowRight, ClipboardList, PackageSearch, Store } from 'lucide-react';
import { Link } from 'react-router-dom';
import { buttonClasses } from '@/components/ui/button';
import { paths } from '@/config/paths';

const audiences = [
  {
    Icon: ClipboardList,
    title: 'For restorers',
    text: 'Find each piece of an assembly by its parts-list line, see which later numbers replace it, and buy it in the condition your restoration calls for.',
  },
  {
    Icon: PackageSearch,
    title: 'Any number, any shape',
    text: "Maker's numbers, ordnance numbers, stock numbers and hardware standards: type them with or without hyphens, and we match them.",
  },
  {
    Icon: Store,
    title: 'For vendors',
    text: 'List new old stock, pulled originals, rebuilt units and reproductions, many at once, and reach people who know what they need.',
  },
];

export function HomeRoute() {
  return (
    <>
      <title>Drabyard · Parts for military vehicle restoration</title>
      <section aria-labelledby="welcome" className="grid gap-8 py-4 lg:grid-cols-[3fr_2fr] lg:items-center">
        <div>
          <p className="text-label text-drab-700 uppercase">Parts catalog · sourcing marketplace</p>
          <h1 id="welcome" className="mt-2 text-4xl font-[780] text-ink">
            The right part, for the vehicle on your stands.
          </h1>
          <p className="mt-4 max-w-2xl text-lg text-ink-soft">
            Drabyard is a parts catalog and marketplace for people who restore and keep running military vehicles.
            Look up what an assembly is made of, follow superseded numbers to what fits today, and source it from
            sellers who hold the stock.
          </p>
          <div className="mt-6 flex flex-wrap gap-3">
            <Link to={paths.catalog.getHref()} className={buttonClasses('primary')}>
              Browse the catalog
              <ArrowRight aria-hidden="true" className="size-4" />
            </Link>
            <Link to={paths.search.getHref()} className={buttonClasses('secondary')}>
              Search parts and numbers
            </Link>
          </div>
        </div>
        {/* A parts tag, to set the tone; decorative. */}
        <div aria-hidden="true" className="relative hidden rotate-[-2deg] rounded-card border border-drab-300 bg-drab-100 p-6 font-mono text-sm text-drab-900 shadow-card lg:block">
          <span className="absolute top-4 right-4 size-4 rounded-full border-2 border-drab-500 bg-paper" />
          <p className="text-label uppercase">Tag · Brakes · Master cylinder</p>
          <p className="mt-3 text-lg font-semibold">DY-4471-0093</p>
          <p className="mt-1">Supersedes DY-4471-0051 · one-way</p>
          <p className="mt-4 border-t border-dashed border-drab-500 pt-3">Replace · source reproduction acceptable</p>
          <p className="mt-2 text-xs">Fictional example</p>
        </div>
      </section>

      <section aria-labelledby="what" className="mt-12">
        <h2 id="what" className="sr-only">
          What Drabyard does
        </h2>
        <ul className="grid gap-4 md:grid-cols-3">
          {audiences.map(({ Icon, title, text }) => (
            <li key={title} className="rounded-card border border-rule bg-paper-raised p-5 shadow-card">
              <Icon aria-hidden="true" className="size-6 text-patina-600" />
              <h3 className="mt-3 text-lg font-semibold text-ink">{title}</h3>
              <p className="mt-1 text-sm text-ink-soft">{text}</p>
            </li>
          ))}
        </ul>
      </section>

      <section aria-labelledby="sell" className="mt-12 flex flex-wrap items-center justify-between gap-4 rounded-card border border-patina-200 bg-patina-50 p-6">
        <div>
          <h2 id="sell" className="text-xl font-semibold text-ink">
            Hold stock others are hunting for?
          </h2>
          <p className="mt-1 text-ink-soft">Create an account and apply to sell. An administrator reviews each seller.</p>
        </div>
        <Link to={paths.account.sellerApplication.getHref()} className={buttonClasses('secondary')}>
          Become a seller
        </Link>
      </section>
    </>
  );
}
