import { ChevronDown, LogOut, UserRound } from 'lucide-react';
import { useEffect, useId, useRef, useState, type KeyboardEvent } from 'react';
import { Link } from 'react-router-dom';
import type { User } from '@shared/schemas/auth';
import { buttonClasses } from '@/components/ui/button';
import { Skeleton } from '@/components/ui/skeleton';
import { paths } from '@/config/paths';

export type AccountMenuProps = {
  user: User | null;
  isPending: boolean;
  onSignOut: () => void;
  isSigningOut: boolean;
};

/**
 * Disclosure-style account menu: the button toggles a list of links; Escape or Tab-ing away closes it;
 * arrow keys move between entries.
 */
export function AccountMenu({ user, isPending, onSignOut, isSigningOut }: AccountMenuProps) {
  if (isPending) return <Skeleton className="h-9 w-32" />;
  if (!user) {
    return (
      <div className="flex items-center gap-2">
        <Link to={paths.auth.signIn.getHref()} className={buttonClasses('ghost', 'sm')}>
          Sign in
        </Link>
        <Link to={paths.auth.register.getHref()} className={buttonClasses('primary', 'sm')}>
          Register
        </Link>
      </div>
    );
  }
  return <SignedInMenu user={user} onSignOut={onSignOut} isSigningOut={isSigningOut} />;
}

function SignedInMenu({ user, onSignOut, isSigningOut }: { user: User; onSignOut: () => void; isSigningOut: boolean }) {
  const [open, setOpen] = useState(false);
  const menuId = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  const buttonRef = useRef<HTMLButtonElement>(null);
  const listRef = useRef<HTMLUListElement>(null);

  useEffect(() => {
    if (!open) return;
    const onPointerDown = (event: PointerEvent) => {
      if (rootRef.current && !rootRef.current.contains(event.target as Node)) setOpen(false);
    };
    document.addEventListener('pointerdown', onPointerDown);
    return () => document.removeEventListener('pointerdown', onPointerDown);
  }, [open]);

  const items = () => Array.from(listRef.current?.querySelectorAll<HTMLElement>('a, button') ?? []);

  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    if (event.key === 'Escape' && open) {
      event.preventDefault();
      setOpen(false);
      buttonRef.current?.focus();
      return;
    }
    if (!open || (event.key !== 'ArrowDown' && event.key !== 'ArrowUp')) return;
    event.preventDefault();
    const list = items();
    const index = list.indexOf(document.activeElement as HTMLElement);
    const step = event.key === 'ArrowDown' ? 1 : -1;
    list[(index + step + list.length) % list.length]?.focus();
  };

  return (
    <div
      ref={rootRef}
      className="relative"
      onKeyDown={onKeyDown}
      onBlur={(event) => {
        if (open && !event.currentTarget.contains(event.relatedTarget as Node | null)) setOpen(false);
      }}
    >
      <button
        ref={buttonRef}
        type="button"
        aria-expanded={open}
        aria-controls={menuId}
        onClick={() => setOpen((v) => !v)}
        className="inline-flex h-9 max-w-[14rem] items-center gap-2 rounded-tag border border-rule-strong bg-paper-raised px-3 text-sm font-medium text-ink hover:bg-paper-sunk"
      >
        <UserRound aria-hidden="true" className="size-4 shrink-0 text-ink-muted" />
        <span className="truncate">{user.displayName}</span>
        <span className="sr-only">, account menu</span>
        <ChevronDown aria-hidden="true" className="size-4 shrink-0 text-ink-muted" />
      </button>
      <ul
        id={menuId}
        ref={listRef}
        hidden={!open}
        className="absolute right-0 z-30 mt-2 w-56 rounded-card border border-rule-strong bg-paper-raised p-1.5 shadow-pop"
      >
        <li className="border-b border-rule px-2.5 pt-1.5 pb-2 text-xs text-ink-muted">
          Signed in as <span className="block truncate font-medium text-ink">{user.email}</span>
        </li>
        <li>
          <Link
            to={paths.account.root.getHref()}
            onClick={() => setOpen(false)}
            className="mt-1 flex h-9 items-center gap-2 rounded-tag px-2.5 text-sm text-ink hover:bg-paper-sunk"
          >
            <UserRound aria-hidden="true" className="size-4 text-ink-muted" />
            Account
          </Link>
        </li>
        <li>
          <button
            type="button"
            onClick={() => {
              setOpen(false);
              onSignOut();
            }}
            disabled={isSigningOut}
            className="flex h-9 w-full items-center gap-2 rounded-tag px-2.5 text-left text-sm text-ink hover:bg-paper-sunk disabled:opacity-60"
          >
            <LogOut aria-hidden="true" className="size-4 text-ink-muted" />
            Sign out
          </button>
        </li>
      </ul>
    </div>
  );
}
