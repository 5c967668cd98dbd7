import { Search } from 'lucide-react';
import { useId, useState, type KeyboardEvent } from 'react';
import { Form, useLocation, useNavigate, useSearchParams } from 'react-router-dom';
import { SEARCH_QUERY_MAX_LENGTH, type Suggestion } from '@shared/schemas/search';
import { paths } from '@/config/paths';
import { cn } from '@/lib/cn';
import { SUGGEST_MIN_LENGTH, useSuggestions } from '../api/get-suggestions';
import { useDebouncedValue } from '../hooks/use-debounced-value';

export const SUGGEST_DEBOUNCE_MS = 200;

/** What a picked suggestion searches for: its number when it has one (the filler set follows), else its name. */
export function suggestionQuery(s: Suggestion): string {
  return s.number ?? s.name;
}

/**
 * The header's one query box, with suggestions as you type (ARIA 1.2 combobox with a listbox popup: focus stays
 * in the input, arrows move the active option, Enter picks it, Escape closes). It stays a plain GET form to
 * /search?q=..., so Enter without a pick searches the words typed.
 */
export function HeaderSearch() {
  const id = useId();
  const listboxId = `${id}-listbox`;
  const navigate = useNavigate();
  const location = useLocation();
  const [searchParams] = useSearchParams();

  // On the search page the box shows the query in force, and follows it through Back and Forward.
  const urlQ = location.pathname === paths.search.path ? (searchParams.get('q') ?? '') : null;
  const [value, setValue] = useState(urlQ ?? '');
  const [seenUrlQ, setSeenUrlQ] = useState(urlQ);
  if (urlQ !== seenUrlQ) {
    setSeenUrlQ(urlQ);
    if (urlQ !== null) setValue(urlQ);
  }

  const [open, setOpen] = useState(false);
  const [active, setActive] = useState(-1);
  const typed = value.trim();
  const debounced = useDebouncedValue(typed, SUGGEST_DEBOUNCE_MS);
  const suggest = useSuggestions(open ? debounced : '');
  // While the next prefix is on its way the last list stays up, so it does not flicker at every key.
  const suggestions = open && typed.length >= SUGGEST_MIN_LENGTH ? (suggest.data?.suggestions ?? []) : [];
  const expanded = suggestions.length > 0;
  const activeIndex = active < suggestions.length ? active : -1;

  const close = () => {
    setOpen(false);
    setActive(-1);
  };

  const pick = (s: Suggestion) => {
    const q = suggestionQuery(s);
    setValue(q);
    close();
    navigate(paths.search.getHref(q));
  };

  const onKeyDown = (e: KeyboardEvent<HTMLInputElement>) => {
    switch (e.key) {
      case 'ArrowDown':
        e.preventDefault();
        setOpen(true);
        if (suggestions.length) setActive((activeIndex + 1) % suggestions.length);
        break;
      case 'ArrowUp':
        e.preventDefault();
        setOpen(true);
        if (suggestions.length) setActive(activeIndex <= 0 ? suggestions.length - 1 : activeIndex - 1);
        break;
      case 'Enter':
        if (expanded && activeIndex >= 0) {
          e.preventDefault();
          pick(suggestions[activeIndex]);
        }
        // Otherwise the form submits the typed words.
        break;
      case 'Escape':
        // First Escape closes the list; a second one clears the box (the APG combobox's behaviour).
        if (expanded) {
          e.preventDefault();
          close();
        } else if (value !== '') {
          e.preventDefault();
          setValue('');
        }
        break;
      default:
        break;
    }
  };

  const optionId = (i: number) => `${id}-option-${i}`;

  return (
    <Form role="search" aria-label="Parts and numbers" method="get" action={paths.search.path} onSubmit={close} className="relative w-full max-w-md">
      <label htmlFor={id} className="sr-only">
        Search parts and numbers
      </label>
      <Search aria-hidden="true" className="pointer-events-none absolute top-1/2 left-3 size-4 -translate-y-1/2 text-ink-muted" />
      <input
        id={id}
        type="search"
        name="q"
        role="combobox"
        aria-autocomplete="list"
        aria-expanded={expanded}
        aria-controls={listboxId}
        aria-activedescendant={expanded && activeIndex >= 0 ? optionId(activeIndex) : undefined}
        value={value}
        onChange={(e) => {
          setValue(e.target.value);
          setOpen(true);
          setActive(-1);
        }}
        onFocus={() => setOpen(true)}
        onBlur={close}
        onKeyDown={onKeyDown}
        placeholder="Part number, NSN or name"
        autoComplete="off"
        spellCheck={false}
        enterKeyHint="search"
        maxLength={SEARCH_QUERY_MAX_LENGTH}
        className="h-10 w-full rounded-tag border border-rule-strong bg-paper-raised pr-3 pl-9 text-sm text-ink placeholder:text-ink-muted focus-visible:border-patina-500"
      />
      <ul
        id={listboxId}
        role="listbox"
        aria-label="Suggestions"
        hidden={!expanded}
        className="absolute inset-x-0 top-full z-30 mt-1 max-h-96 overflow-y-auto rounded-card border border-rule-strong bg-paper-raised py-1 shadow-pop"
      >
        {suggestions.map((s, i) => (
          <li
            key={`${s.partId}-${s.number ?? s.name}`}
            id={optionId(i)}
            role="option"
            aria-selected={i === activeIndex}
            // Keep focus in the input (and the list open) while the pointer picks.
            onMouseDown={(e) => e.preventDefault()}
            onClick={() => pick(s)}
            onMouseMove={() => i !== activeIndex && setActive(i)}
            className={cn('flex cursor-pointer items-baseline gap-3 px-3 py-2 text-sm', i === activeIndex ? 'bg-patina-50 text-ink' : 'text-ink-soft')}
          >
            {s.number ? <span className={cn('shrink-0 font-mono font-semibold', i === activeIndex ? 'text-patina-800' : 'text-ink')}>{s.number}</span> : null}
            <span className="line-clamp-2 min-w-0">{s.name}</span>
          </li>
        ))}
      </ul>
      <span className="sr-only" aria-live="polite">
        {expanded ? `${suggestions.length} suggestion${suggestions.length === 1 ? '' : 's'}, use the arrow keys to choose` : ''}
      </span>
    </Form>
  );
}
