import type { NavItem } from '@/components/layouts/app-layout';
import { paths } from '@/config/paths';

/** The navbar, in the order a keeper's day runs. */
export const NAV_ITEMS: NavItem[] = [
  { label: 'Today', to: paths.home.href(), end: true },
  { label: 'Collection', to: paths.collection.href() },
  { label: 'Projects', to: paths.projects.href() },
  { label: 'Incubator', to: paths.incubator.href() },
  { label: 'Settings', to: paths.settings.href() },
];
