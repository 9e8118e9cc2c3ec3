import { Badge, Box, Button } from '@mantine/core';
import { NavLink as RouterNavLink } from 'react-router';
import { paths } from '@/config/paths';
import { useUnreadCount } from '../api/notifications';
import { useWords } from '@/lib/i18n';

/** The shell's way to the inbox, with the unread count (refreshed by itself). */
export function InboxLink() {
  const t = useWords();
  const { data: unread = 0 } = useUnreadCount();
  return (
    <Button
      component={RouterNavLink}
      to={paths.notifications.href()}
      variant="subtle"
      color="gray"
      size="compact-sm"
      aria-label={unread ? t('page.notifications.linkUnread', { count: unread }) : t('page.notifications.linkNothing')}
      rightSection={
        unread ? (
          <Badge size="sm" circle={unread < 10} data-testid="unread-count">
            {unread}
          </Badge>
        ) : null
      }
    >
      {/* On a phone the header has room for the badge only; the word comes back from `xs` up. */}
      <Box component="span" hiddenFrom="xs" aria-hidden>
        ✉
      </Box>
      <Box component="span" visibleFrom="xs">
        {t('page.notifications.inbox')}
      </Box>
    </Button>
  );
}
