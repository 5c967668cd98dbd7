import type { ReactNode } from 'react';
import { useNavigation } from 'react-router-dom';
import type { User } from '@shared/schemas/auth';
import { HeaderSearch } from '@/features/search/components/header-search';
import { AccountMenu } from './account-menu';
import { Footer } from './footer';
import { SiteNav } from './site-nav';
import { Wordmark } from './wordmark';

export type MainLayoutProps = {
  user: User | null;
  isUserPending: boolean;
  onSignOut: () => void;
  isSigningOut: boolean;
  children: ReactNode;
};

export function MainLayout({ user, isUserPending, onSignOut, isSigningOut, children }: MainLayoutProps) {
  const navigation = useNavigation();
  const isNavigating = navigation.state === 'loading';
  return (
    <div className="flex min-h-dvh flex-col">
      <a
        href="#main"
        className="sr-only z-50 rounded-tag bg-ink px-4 py-2 font-semibold text-paper focus:not-sr-only focus:fixed focus:top-3 focus:left-3"
      >
        Skip to content
      </a>
      {/* Thin progress bar while a route's code or data loads. */}
      <div aria-hidden="true" className="fixed inset-x-0 top-0 z-40 h-0.5 overflow-hidden">
        {isNavigating ? <div className="h-full w-2/5 animate-progress bg-patina-500" /> : null}
      </div>
      <header className="border-b border-rule bg-paper-raised/80">
        <div className="h-1 bg-patina-600" aria-hidden="true" />
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-3 px-4 py-3 sm:px-6">
          <Wordmark />
          <div className="order-3 w-full sm:order-none sm:w-auto sm:flex-1">
            <HeaderSearch />
          </div>
          <div className="ml-auto">
            <AccountMenu user={user} isPending={isUserPending} onSignOut={onSignOut} isSigningOut={isSigningOut} />
          </div>
        </div>
        <div className="mx-auto max-w-6xl px-4 pb-2 sm:px-6">
          {isUserPending ? <div className="h-9" /> : <SiteNav user={user} />}
        </div>
      </header>
      <main id="main" tabIndex={-1} aria-busy={isNavigating || undefined} className="mx-auto w-full max-w-6xl flex-1 px-4 py-8 focus:outline-none sm:px-6">
        {children}
      </main>
      <Footer />
    </div>
  );
}
