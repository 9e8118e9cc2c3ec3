import { useState } from 'react';
import type { QueryClient } from '@tanstack/react-query';
import { useMe } from '@/features/auth/api/me';
import { notificationQueries } from '@/features/notifications/api/notifications';
import { NotificationList } from '@/features/notifications/components/notification-list';
import { PageHeader } from '@/components/ui/page-header';
import { preloadPanels } from '../preload';
import { useWords } from '@/lib/i18n';

export const clientLoader = (qc: QueryClient) => async () => {
  void preloadPanels(qc.ensureQueryData(notificationQueries.page(1)));
  return null;
};

export function Component() {
  const t = useWords();
  const { data: me } = useMe();
  const [page, setPage] = useState(1);
  if (!me) return null;
  return (
    <>
      <PageHeader title={t('page.notifications.inbox')} description={t('page.notifications.description')} />
      <NotificationList page={page} onPage={setPage} timeZone={me.timeZone} />
    </>
  );
}
