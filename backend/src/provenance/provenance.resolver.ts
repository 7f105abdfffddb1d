import { Context, Parent, ResolveField, Resolver } from '@nestjs/graphql';
import type DataLoader from 'dataloader';
import { AgeModelRunRow, AgeModelRunsRepository } from '../age-models/age-model-runs.repository';
import { ProvenanceRepository } from './provenance.repository';
import { ProvenanceService, type ResultReference } from './provenance.service';
import type { InputKind, ResultKind, StaleReason } from './staleness';

/** The GraphQL context this module adds its per-request loader to. */
interface ProvenanceContext {
  staleReasons?: DataLoader<ResultReference, readonly StaleReason[], string>;
}

const INPUT_KIND: Record<InputKind, string> = { site: 'SITE_COLUMN', hypothesis: 'HYPOTHESIS', ageModelRun: 'AGE_MODEL_RUN', jointRun: 'JOINT_RUN' };

/** Stale reasons as the API names input kinds. */
export function reasonsView(reasons: readonly StaleReason[]) {
  return reasons.map((r) => ({ ...r, inputKind: INPUT_KIND[r.inputKind] }));
}

function reasonsOf(context: ProvenanceContext, service: ProvenanceService, kind: ResultKind, id: string) {
  context.staleReasons ??= service.loader();
  return context.staleReasons.load({ kind, id });
}

@Resolver('AgeModelRun')
export class AgeModelRunProvenanceResolver {
  constructor(private readonly provenance: ProvenanceService) {}

  @ResolveField('staleReasons')
  async staleReasons(@Parent() run: AgeModelRunRow, @Context() context: ProvenanceContext) {
    return reasonsView(await reasonsOf(context, this.provenance, 'ageModelRun', run.id));
  }
}

@Resolver('RecurrenceAnalysis')
export class RecurrenceProvenanceResolver {
  constructor(
    private readonly provenance: ProvenanceService,
    private readonly repository: ProvenanceRepository,
    private readonly runs: AgeModelRunsRepository,
  ) {}

  @ResolveField('stale')
  async stale(@Parent() analysis: { id: string }, @Context() context: ProvenanceContext): Promise<boolean> {
    return (await reasonsOf(context, this.provenance, 'recurrenceAnalysis', analysis.id)).length > 0;
  }

  @ResolveField('staleReasons')
  async staleReasons(@Parent() analysis: { id: string }, @Context() context: ProvenanceContext) {
    return reasonsView(await reasonsOf(context, this.provenance, 'recurrenceAnalysis', analysis.id));
  }

  @ResolveField('inputs')
  async inputs(@Parent() analysis: { id: string }) {
    const recorded = await this.provenance.inputsOf({ kind: 'recurrenceAnalysis', id: analysis.id });
    const runIds = recorded.filter((i) => i.kind === 'ageModelRun').map((i) => i.id);
    const hypothesis = recorded.find((i) => i.kind === 'hypothesis');
    const joint = recorded.find((i) => i.kind === 'jointRun');
    const runs = new Map((await this.runs.runsForDisplay(runIds)).map((run) => [run.id, run]));
    const [hypothesisRow] = hypothesis ? await this.repository.hypothesisRows([hypothesis.id]) : [];
    return {
      ageModelRuns: runIds.flatMap((id) => runs.get(id) ?? []),
      jointRun: joint ? { id: joint.id } : null,
      hypothesis: hypothesisRow ?? null,
      hypothesisVersion: hypothesis?.revision ?? null,
      recorded: recorded.map((i) => ({ kind: INPUT_KIND[i.kind], id: i.id, name: i.name, revision: i.revision })),
    };
  }
}
