import { Module } from '@nestjs/common';
import { AgeModelsModule } from '../age-models/age-models.module';
import { ProvenanceRepository } from './provenance.repository';
import { AgeModelRunProvenanceResolver, RecurrenceProvenanceResolver } from './provenance.resolver';
import { ProvenanceService } from './provenance.service';

/** What every derived result was computed from and whether it is stale; exported for every producer of results. */
@Module({
  imports: [AgeModelsModule],
  providers: [ProvenanceRepository, ProvenanceService, AgeModelRunProvenanceResolver, RecurrenceProvenanceResolver],
  exports: [ProvenanceService, ProvenanceRepository],
})
export class ProvenanceModule {}
