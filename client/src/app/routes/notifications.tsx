import { useState } from 'react';
import type { QueryClient } from '@tanstack/react-query';
import { useMe } from '@/features/auth/api/me';
import { notificationQueries } from '@/features/notifications/api/notifications';
import { NotificationList } from '@/features/notifications/components/notification-list';
import { PageHeader } from '@/components/ui/page-header';
import { preloadPanels } from '../preload';

export const clientLoader = (qc: QueryClient) => async () => {
  void preloadPanels(qc.ensureQueryData(notificationQueries.page(1)));
  return null;
};

export function Component() {
  const { data: me } = useMe();
  const [page, setPage] = useState(1);
  if (!me) return null;
  return (
    <>
      <PageHeader title="Inbox" description="Your reminders, newest first. Choose which ones come here in your settings." />
      <NotificationList page={page} onPage={setPage} timeZone={me.timeZone} />
    </>
  );
}
