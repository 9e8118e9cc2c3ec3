import { ActionIcon, AppShell, Burger, Group, Menu, NavLink, Text, Tooltip, useMantineColorScheme } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import type { ReactNode } from 'react';
import { NavLink as RouterNavLink, useLocation } from 'react-router';
import { BroodsilkLogo } from '../ui/logo';
import { useWords } from '@/lib/i18n';

export interface NavItem {
  label: string;
  to: string;
  end?: boolean;
}

interface AppLayoutProps {
  nav: NavItem[];
  userName: string;
  onSignOut: () => void;
  settingsHref: string;
  /** What the app puts in the header before the colour scheme switch (the inbox link). */
  headerExtra?: ReactNode;
  children: ReactNode;
}

/** The signed-in shell: a header with the mark and the user, a navbar that folds away on a phone. */
export function AppLayout({ nav, userName, onSignOut, settingsHref, headerExtra, children }: AppLayoutProps) {
  const t = useWords();
  const [opened, { toggle, close }] = useDisclosure();
  const { toggleColorScheme, colorScheme } = useMantineColorScheme();
  const location = useLocation();

  return (
    <>
      <a href="#main" className="skip-link">
        {t('page.shell.skipToContent')}
      </a>
      <AppShell header={{ height: 56 }} navbar={{ width: 220, breakpoint: 'sm', collapsed: { mobile: !opened } }} padding="md">
        <AppShell.Header>
          <Group h="100%" px="md" justify="space-between" wrap="nowrap">
            <Group gap="sm" wrap="nowrap">
              <Burger opened={opened} onClick={toggle} hiddenFrom="sm" size="sm" aria-label={t('page.shell.openNavigation')} />
              <BroodsilkLogo />
            </Group>
            <Group gap="xs" wrap="nowrap">
              {headerExtra}
              <Tooltip label={colorScheme === 'dark' ? t('page.shell.lightScheme') : t('page.shell.darkScheme')}>
                <ActionIcon variant="subtle" color="gray" onClick={toggleColorScheme} aria-label={t('page.shell.switchScheme')}>
                  {colorScheme === 'dark' ? '☀' : '☾'}
                </ActionIcon>
              </Tooltip>
              <Menu position="bottom-end" withinPortal>
                <Menu.Target>
                  <Text
                    component="button"
                    fw={600}
                    size="sm"
                    data-testid="shell-user"
                    maw={{ base: 80, sm: 260 }}
                    truncate="end"
                    title={userName}
                    style={{ background: 'none', border: 0, cursor: 'pointer', color: 'inherit', whiteSpace: 'nowrap' }}
                  >
                    {userName}
                  </Text>
                </Menu.Target>
                <Menu.Dropdown>
                  <Menu.Item component={RouterNavLink} to={settingsHref}>
                    {t('page.shell.settings')}
                  </Menu.Item>
                  <Menu.Item color="clay" onClick={onSignOut}>
                    {t('page.shell.signOut')}
                  </Menu.Item>
                </Menu.Dropdown>
              </Menu>
            </Group>
          </Group>
        </AppShell.Header>
        <AppShell.Navbar p="xs">
          {nav.map((item) => (
            <NavLink
              key={item.to}
              component={RouterNavLink}
              to={item.to}
              label={item.label}
              end={item.end}
              active={item.end ? location.pathname === item.to : location.pathname.startsWith(item.to)}
              onClick={close}
            />
          ))}
        </AppShell.Navbar>
        <AppShell.Main id="main" tabIndex={-1}>
          {children}
        </AppShell.Main>
      </AppShell>
    </>
  );
}
