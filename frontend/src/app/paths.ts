/**
 * Every route pattern of the app and a builder for its links; router.tsx mounts the patterns
 * and everything else links through the builders.
 */
export const routePatterns = {
  root: '/',
  signIn: '/signin',
  acceptInvitation: '/accept-invitation',
  forgotPassword: '/forgot-password',
  resetPassword: '/reset-password',
  projects: '/projects',
  project: '/projects/:projectId',
  site: '/projects/:projectId/sites/:siteId',
  ageModel: '/projects/:projectId/sites/:siteId/age-model',
  ladder: '/projects/:projectId/ladder',
  recurrence: '/projects/:projectId/recurrence',
  projectAdmin: '/projects/:projectId/admin',
  calibrate: '/calibrate',
} as const;

/** Tabs of the site page, kept in the `tab` search parameter so each can be linked to. */
export type SiteTab = 'column' | 'samples' | 'calibration' | 'logs' | 'files';

export const paths = {
  signIn: ({ next }: { next?: string } = {}) =>
    next && next !== routePatterns.signIn ? `${routePatterns.signIn}?next=${encodeURIComponent(next)}` : routePatterns.signIn,
  forgotPassword: () => routePatterns.forgotPassword,
  projects: () => routePatterns.projects,
  project: (projectId: string) => `/projects/${encodeURIComponent(projectId)}`,
  site: (projectId: string, siteId: string, tab?: SiteTab) =>
    `/projects/${encodeURIComponent(projectId)}/sites/${encodeURIComponent(siteId)}${tab && tab !== 'column' ? `?tab=${tab}` : ''}`,
  ageModel: (projectId: string, siteId: string) => `/projects/${encodeURIComponent(projectId)}/sites/${encodeURIComponent(siteId)}/age-model`,
  ladder: (projectId: string) => `/projects/${encodeURIComponent(projectId)}/ladder`,
  recurrence: (projectId: string) => `/projects/${encodeURIComponent(projectId)}/recurrence`,
  projectAdmin: (projectId: string) => `/projects/${encodeURIComponent(projectId)}/admin`,
  calibrate: () => routePatterns.calibrate,
};

/** Where to go after sign-in: a path inside the app from `?next=`, else the project list. */
export function afterSignInPath(next: string | null): string {
  return next && next.startsWith('/') && !next.startsWith('//') ? next : paths.projects();
}

/** Record ids are UUIDs made by PostgreSQL (backend `database/schema/columns.ts`). */
const RECORD_ID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * Whether every id parameter of a route (`projectId`, `siteId`, ...) is shaped like a record id.
 * Anything else names no record, so the route is not found at once instead of after a request
 * and its retries.
 */
export function routeIdsWellFormed(params: Readonly<Record<string, string | undefined>>): boolean {
  return Object.entries(params)
    .filter(([name]) => name.endsWith('Id'))
    .every(([, value]) => value !== undefined && RECORD_ID.test(value));
}
