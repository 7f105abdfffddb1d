import { Module } from '@nestjs/common';
import { ProvenanceModule } from '../../provenance/provenance.module';
import { FreshJointRunsService } from './fresh-joint-runs.service';
import { JointChainJob } from './joint-chain.job';
import { JointRunSettler } from './joint-run-settler';
import { JointRunsRepository } from './joint-runs.repository';

/**
 * Joint age model runs as workers and other features need them: the chain jobs, the settling of
 * a run from its chains, and the fresh run of a hypothesis (regional events, segment recurrence).
 * Starting runs and the API are in JointRunsApiModule.
 */
@Module({
  imports: [ProvenanceModule],
  providers: [JointRunsRepository, JointRunSettler, JointChainJob, FreshJointRunsService],
  exports: [JointRunsRepository, JointRunSettler, JointChainJob, FreshJointRunsService],
})
export class JointRunsModule {}
