import type { SiteQuery } from '@/gql/graphql';

/** A site as its page reads it. */
export type SiteDetail = SiteQuery['site'];
export type UnitRow = SiteDetail['units'][number];
export type EventHorizonRow = SiteDetail['eventHorizons'][number];
export type SampleRow = SiteDetail['samples'][number];
