import { Outlet, ScrollRestoration, useNavigate } from 'react-router-dom';
import { toast } from 'sonner';
import { MainLayout } from '@/components/layouts/main-layout';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { useLogout } from '@/features/auth/api/logout';

/** The root route: the site layout, wired to the session. */
export function AppRoot() {
  const me = useMe();
  const navigate = useNavigate();
  // Leave any signed-in page before the session is cleared, so it does not flash "signed out".
  const logout = useLogout({ onSuccess: () => navigate(paths.home.getHref()) });

  const onSignOut = () =>
    logout.mutate(undefined, {
      onSuccess: () => toast.success('You are signed out.'),
      onError: (error) => toast.error(error.message),
    });

  return (
    <MainLayout user={me.data ?? null} isUserPending={me.isPending} onSignOut={onSignOut} isSigningOut={logout.isPending}>
      <Outlet />
      <ScrollRestoration />
    </MainLayout>
  );
}
