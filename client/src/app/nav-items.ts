import type { NavItem } from '@/components/layouts/app-layout';
import { paths } from '@/config/paths';
import type { Words } from '@broodsilk/shared';

/** The navbar, in the order a keeper's day runs, in the reader's words. */
export const navItems = (t: Words): NavItem[] => [
  { label: t('page.shell.nav.today'), to: paths.home.href(), end: true },
  { label: t('page.shell.nav.collection'), to: paths.collection.href() },
  { label: t('page.shell.nav.projects'), to: paths.projects.href() },
  { label: t('page.shell.nav.incubator'), to: paths.incubator.href() },
  { label: t('page.shell.nav.settings'), to: paths.settings.href() },
];
