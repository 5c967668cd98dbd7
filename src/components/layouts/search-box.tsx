import { Search } from 'lucide-react';
import { useId } from 'react';
import { Form, useSearchParams } from 'react-router-dom';
import { paths } from '@/config/paths';

/** Header search: a plain GET form to /search?q=..., so it also works before the search page is built. */
export function SearchBox() {
  const id = useId();
  const [searchParams] = useSearchParams();
  return (
    <Form role="search" method="get" action={paths.search.path} className="relative w-full max-w-md">
      <label htmlFor={id} className="sr-only">
        Search parts and numbers
      </label>
      <Search aria-hidden="true" className="pointer-events-none absolute top-1/2 left-3 size-4 -translate-y-1/2 text-ink-muted" />
      <input
        id={id}
        type="search"
        name="q"
        defaultValue={searchParams.get('q') ?? ''}
        placeholder="Part number, NSN or name"
        autoComplete="off"
        enterKeyHint="search"
        maxLength={200}
        className="h-10 w-full rounded-tag border border-rule-strong bg-paper-raised pr-3 pl-9 text-sm text-ink placeholder:text-ink-muted focus-visible:border-patina-500"
      />
    </Form>
  );
}
