import { redirect, useNavigate, type LoaderFunctionArgs } from 'react-router';
import type { QueryClient } from '@tanstack/react-query';
import { AppLayout } from '@/components/layouts/app-layout';
import { PendingOutlet } from '@/components/layouts/pending-outlet';
import { paths } from '@/config/paths';
import { meQuery, useMe } from '@/features/auth/api/me';
import { useLogout } from '@/features/auth/api/session';
import { InboxLink } from '@/features/notifications/components/inbox-link';
import { navItems } from '../nav-items';
import { useReaderSettings, useWords } from '@/lib/i18n';

/** Every signed-in page goes through here: no session, no page. */
export const clientLoader =
  (qc: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const me = await qc.ensureQueryData(meQuery());
    if (!me) {
      const url = new URL(request.url);
      throw redirect(paths.signIn.href(url.pathname + url.search));
    }
    return null;
  };

export function Component() {
  const { data: me } = useMe();
  const logout = useLogout();
  const navigate = useNavigate();
  const language = useReaderSettings(me);
  const t = useWords();
  if (!me) return null;
  return (
    <AppLayout
      nav={navItems(t)}
      userName={me.displayName}
      settingsHref={paths.settings.href()}
      headerExtra={<InboxLink />}
      onSignOut={() => logout.mutate(undefined, { onSettled: () => navigate(paths.signIn.href()) })}
    >
      {/* Keyed by language so every page re-renders its words when the setting changes. */}
      <PendingOutlet key={language} />
    </AppLayout>
  );
}
