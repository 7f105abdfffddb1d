import { Parent, ResolveField, Resolver } from '@nestjs/graphql';
import { EventAgeSource, eventAgeSourceOf } from './joint-run-source';
import type { RecurrenceAnalysisRow } from './recurrence.repository';

/** `RecurrenceAnalysis.source`: where its event ages came from. */
@Resolver('RecurrenceAnalysis')
export class RecurrenceSourceResolver {
  @ResolveField('source')
  source(@Parent() analysis: Pick<RecurrenceAnalysisRow, 'source' | 'inputSnapshot'>): EventAgeSource {
    return eventAgeSourceOf(analysis);
  }
}
