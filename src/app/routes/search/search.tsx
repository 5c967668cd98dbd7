import { useSearchParams } from 'react-router-dom';
import { ComingSoon } from '@/components/layouts/coming-soon';

export function SearchRoute() {
  const [params] = useSearchParams();
  const q = params.get('q')?.trim();
  return (
    <ComingSoon title="Search" eyebrow="Parts and numbers">
      {q ? <p>Results for “{q}” will show here.</p> : null}
      <p>Search will find parts by any number they carry, typed in any shape, and by name.</p>
    </ComingSoon>
  );
}
