import { Module } from '@nestjs/common';
import { ProvenanceRepository } from './provenance.repository';
import { ProvenanceService } from './provenance.service';

/** What every derived result was computed from and whether it is stale; imported by every producer of results. */
@Module({
  providers: [ProvenanceRepository, ProvenanceService],
  exports: [ProvenanceService, ProvenanceRepository],
})
export class ProvenanceModule {}
