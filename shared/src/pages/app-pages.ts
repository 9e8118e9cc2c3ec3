/**
 * Every page address of the web client, as route patterns (`:name` is one path segment). The client's
 * router is built from these; the server answers them with the client and anything else with a 404.
 */
export const APP_PAGES = {
  home: '/',
  signIn: '/sign-in',
  register: '/register',
  forgotPassword: '/forgot-password',
  resetPassword: '/reset-password',
  confirmEmail: '/confirm-email',
  settings: '/settings',
  notifications: '/notifications',
  collection: '/collection',
  animal: '/collection/:animalId',
  species: '/species',
  projects: '/projects',
  newProject: '/projects/new',
  project: '/projects/:projectId',
  projectAccount: '/projects/:projectId/account',
  payouts: '/settings/payouts',
  sac: '/sacs/:sacId',
  incubator: '/incubator',
  incubatorSac: '/incubator/:sacId',
  invitation: '/invitations/:token',
  progress: '/progress/:token',
} as const;

/** Addresses people guess, sent on to the page they mean. */
export const APP_PAGE_ALIASES: Readonly<Record<string, string>> = { '/login': APP_PAGES.signIn };

const segments = (path: string) => path.split('/').filter(Boolean);
const PATTERNS = Object.values(APP_PAGES).map(segments);

/** Whether `pathname` (no query) is one of the client's pages; one trailing slash is allowed. */
export function isAppPage(pathname: string): boolean {
  const parts = segments(pathname);
  if (pathname.includes('//') || parts.some((p) => p === '.' || p === '..')) return false;
  return PATTERNS.some((pattern) => pattern.length === parts.length && pattern.every((p, i) => (p.startsWith(':') ? parts[i] !== '' : p === parts[i])));
}
