import type { ProjectOverviewQuery } from '@/gql/graphql';

/** A project as the overview page reads it. */
export type ProjectOverview = ProjectOverviewQuery['project'];
export type SegmentRow = ProjectOverview['segments'][number];
export type SiteRow = ProjectOverview['sites'][number];
