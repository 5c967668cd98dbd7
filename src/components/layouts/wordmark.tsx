import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';

/** The Drabyard wordmark, set in type (the brand has no logo image). */
export function Wordmark() {
  return (
    <Link to={paths.home.getHref()} className="group inline-flex items-baseline gap-1 rounded-tag text-ink">
      <span className="text-xl font-[820] tracking-[-0.03em]">Drabyard</span>
      <span aria-hidden="true" className="size-1.5 translate-y-[-0.1rem] rounded-full bg-patina-500 group-hover:bg-patina-700" />
    </Link>
  );
}
