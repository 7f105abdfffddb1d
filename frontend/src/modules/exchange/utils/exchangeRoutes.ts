/** The tables a project exports as CSV, by their URL name (backend exchange/csv-tables.ts). */
export const CSV_TABLES = ['sites', 'units', 'event-horizons', 'samples', 'hypotheses', 'ties'] as const;
export type CsvTable = (typeof CSV_TABLES)[number];

/** Table names as people read them. */
export const CSV_TABLE_LABELS: Record<CsvTable, string> = {
  sites: 'Sites',
  units: 'Units',
  'event-horizons': 'Event horizons',
  samples: 'Samples',
  hypotheses: 'Hypotheses',
  ties: 'Ties',
};

/** The exchange routes of backend/src/exchange/exchange.controller.ts. */
export const exchangeRoutes = {
  bundle: (projectId: string) => `/api/projects/${encodeURIComponent(projectId)}/bundle.json`,
  csv: (projectId: string, table: CsvTable) => `/api/projects/${encodeURIComponent(projectId)}/export/${table}.csv`,
  sitesGeoJson: (projectId: string) => `/api/projects/${encodeURIComponent(projectId)}/sites.geojson`,
  importBundle: () => '/api/projects/import',
};
