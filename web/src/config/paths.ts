/**
 * Every route of the app in one place: `path` is the router pattern, `getHref` builds a link.
 * Components never write URL strings by hand.
 */
const q = (params: Record<string, string | number | undefined>): string => {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params))
    if (value !== undefined && value !== '') search.set(key, String(value));
  const s = search.toString();
  return s ? `?${s}` : '';
};

export const paths = {
  home: { path: '/', getHref: () => '/' },
  signIn: {
    path: '/sign-in',
    getHref: (redirectTo?: string) =>
      `/sign-in${q({ redirectTo: redirectTo && redirectTo !== '/sign-in' ? redirectTo : undefined })}`,
  },
  projects: { path: '/projects', getHref: () => '/projects' },
  project: {
    path: '/projects/:projectId',
    getHref: (projectId: number | string) => `/projects/${projectId}`,
  },
  upload: {
    path: '/projects/:projectId/upload',
    getHref: (projectId: number | string) => `/projects/${projectId}/upload`,
  },
  submittal: {
    path: '/submittals/:submittalId',
    getHref: (submittalId: number | string, revision?: number) =>
      `/submittals/${submittalId}${q({ revision })}`,
  },
  report: {
    path: '/submittals/:submittalId/report',
    getHref: (submittalId: number | string, revision?: number) =>
      `/submittals/${submittalId}/report${q({ revision })}`,
  },
  discrepancies: {
    path: '/discrepancies',
    getHref: (
      filters: { projectId?: number | string; submittalId?: number | string; status?: string } = {},
    ) => `/discrepancies${q(filters)}`,
  },
  discrepancy: {
    path: '/discrepancies/:discrepancyId',
    getHref: (discrepancyId: number | string) => `/discrepancies/${discrepancyId}`,
  },
  invitation: {
    path: '/invitations/:token',
    getHref: (token: string) => `/invitations/${encodeURIComponent(token)}`,
  },
  dashboard: { path: '/dashboard', getHref: () => '/dashboard' },
  admin: { path: '/admin', getHref: () => '/admin' },
  account: { path: '/account', getHref: () => '/account' },
  mailbox: { path: '/mailbox', getHref: () => '/mailbox' },
  notifications: { path: '/notifications', getHref: () => '/notifications' },
} as const;
