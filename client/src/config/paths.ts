/** Every route path of the client, in one place. */
export const paths = {
  home: { path: '/', href: () => '/' },
  signIn: { path: '/sign-in', href: (next?: string) => (next && next !== '/' ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in') },
  register: { path: '/register', href: () => '/register' },
  forgotPassword: { path: '/forgot-password', href: () => '/forgot-password' },
  resetPassword: { path: '/reset-password', href: () => '/reset-password' },
  settings: { path: '/settings', href: () => '/settings' },
  collection: { path: '/collection', href: () => '/collection' },
  animal: { path: '/collection/:animalId', href: (animalId: string) => `/collection/${animalId}` },
  species: { path: '/species', href: () => '/species' },
  projects: { path: '/projects', href: () => '/projects' },
  newProject: { path: '/projects/new', href: () => '/projects/new' },
  project: { path: '/projects/:projectId', href: (projectId: string) => `/projects/${projectId}` },
  sac: { path: '/sacs/:sacId', href: (sacId: string) => `/sacs/${sacId}` },
  incubator: { path: '/incubator', href: () => '/incubator' },
  incubatorSac: { path: '/incubator/:sacId', href: (sacId: string) => `/incubator/${sacId}` },
  invitation: { path: '/invitations/:token', href: (token: string) => `/invitations/${encodeURIComponent(token)}` },
} as const;
