import { APP_PAGES } from '@broodsilk/shared';

/** Every route path of the client (the patterns are shared with the server, which answers other paths with 404) and how to link to it. */
export const paths = {
  home: { path: APP_PAGES.home, href: () => '/' },
  signIn: { path: APP_PAGES.signIn, href: (next?: string) => (next && next !== '/' ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in') },
  register: { path: APP_PAGES.register, href: (next?: string) => (next && next !== '/' ? `/register?next=${encodeURIComponent(next)}` : '/register') },
  forgotPassword: { path: APP_PAGES.forgotPassword, href: () => '/forgot-password' },
  resetPassword: { path: APP_PAGES.resetPassword, href: () => '/reset-password' },
  confirmEmail: { path: APP_PAGES.confirmEmail, href: () => '/confirm-email' },
  settings: { path: APP_PAGES.settings, href: () => '/settings' },
  notifications: { path: APP_PAGES.notifications, href: () => '/notifications' },
  collection: { path: APP_PAGES.collection, href: () => '/collection' },
  animal: { path: APP_PAGES.animal, href: (animalId: string) => `/collection/${animalId}` },
  species: { path: APP_PAGES.species, href: () => '/species' },
  projects: { path: APP_PAGES.projects, href: () => '/projects' },
  newProject: { path: APP_PAGES.newProject, href: () => '/projects/new' },
  project: { path: APP_PAGES.project, href: (projectId: string) => `/projects/${projectId}` },
  projectAccount: { path: APP_PAGES.projectAccount, href: (projectId: string) => `/projects/${projectId}/account` },
  payouts: { path: APP_PAGES.payouts, href: () => '/settings/payouts' },
  sac: { path: APP_PAGES.sac, href: (sacId: string) => `/sacs/${sacId}` },
  incubator: { path: APP_PAGES.incubator, href: () => '/incubator' },
  incubatorSac: { path: APP_PAGES.incubatorSac, href: (sacId: string) => `/incubator/${sacId}` },
  invitation: { path: APP_PAGES.invitation, href: (token: string) => `/invitations/${encodeURIComponent(token)}` },
  progress: { path: APP_PAGES.progress, href: (token: string) => `/progress/${encodeURIComponent(token)}` },
} as const;
