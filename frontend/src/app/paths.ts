/**
 * Every route pattern of the app and a builder for its links; router.tsx mounts the patterns
 * and everything else links through the builders. Planned next, under its feature module:
 * `/projects/:projectId/admin`.
 */
export const routePatterns = {
  root: '/',
  signIn: '/signin',
  projects: '/projects',
  project: '/projects/:projectId',
  site: '/projects/:projectId/sites/:siteId',
  ageModel: '/projects/:projectId/sites/:siteId/age-model',
  ladder: '/projects/:projectId/ladder',
  recurrence: '/projects/:projectId/recurrence',
  calibrate: '/calibrate',
} as const;

/** Tabs of the site page, kept in the `tab` search parameter so each can be linked to. */
export type SiteTab = 'column' | 'samples' | 'calibration';

export const paths = {
  signIn: ({ next }: { next?: string } = {}) =>
    next && next !== routePatterns.signIn ? `${routePatterns.signIn}?next=${encodeURIComponent(next)}` : routePatterns.signIn,
  projects: () => routePatterns.projects,
  project: (projectId: string) => `/projects/${encodeURIComponent(projectId)}`,
  site: (projectId: string, siteId: string, tab?: SiteTab) =>
    `/projects/${encodeURIComponent(projectId)}/sites/${encodeURIComponent(siteId)}${tab && tab !== 'column' ? `?tab=${tab}` : ''}`,
  ageModel: (projectId: string, siteId: string) => `/projects/${encodeURIComponent(projectId)}/sites/${encodeURIComponent(siteId)}/age-model`,
  ladder: (projectId: string) => `/projects/${encodeURIComponent(projectId)}/ladder`,
  recurrence: (projectId: string) => `/projects/${encodeURIComponent(projectId)}/recurrence`,
  calibrate: () => routePatterns.calibrate,
};

/** Where to go after sign-in: a path inside the app from `?next=`, else the project list. */
export function afterSignInPath(next: string | null): string {
  return next && next.startsWith('/') && !next.startsWith('//') ? next : paths.projects();
}
