import type { ApolloServerPlugin } from '@apollo/server';
import { DocumentNode, GraphQLError, GraphQLOutputType, GraphQLSchema, isListType, isNonNullType } from 'graphql';
import { ComplexityEstimator, getComplexity } from 'graphql-query-complexity';
import { answerJson } from './answer-json';

/**
 * The cost model of one GraphQL operation. A field costs its own weight (what it computes: a
 * calibration, a density, a password hash, a regional-event check) plus its selection's cost,
 * and a list field multiplies its selection's cost by its expected length (`first` when given).
 * The whole operation has a cap, and the most expensive fields a cap on how often one operation
 * may ask for them (aliases count separately). Weights are relative work units, set from
 * `npm run bench` timings; the cap leaves every screen's own query well inside (see
 * graphql-cost.spec.ts, which prices them all).
 */

/** Most cost units one operation may have (about a second of work); every screen's query costs under half of it. */
export const MAX_OPERATION_COST = 100_000;

/** Largest answer sent, bytes of JSON; larger answers are refused after the fact (a backstop to the cost model). */
export const MAX_ANSWER_BYTES = 16 * 1024 * 1024;

/** Expected length of a list without a `first` argument and without an entry below. */
const DEFAULT_LIST_LENGTH = 20;

/**
 * Weights of fields that compute something; every other field weighs 1. One unit is roughly 10
 * microseconds of server work at its worst for bounded inputs (`npm run bench`, "api: cost
 * model" figures): a bcrypt hash about 70 ms, a calibration with the widest allowed error about
 * 50 ms, a hypothesis's regional-event check about 20 ms.
 */
export const FIELD_WEIGHTS: Readonly<Record<string, number>> = {
  // bcrypt hashes
  'Mutation.signIn': 7_000,
  'Mutation.acceptInvitation': 7_000,
  'Mutation.resetPassword': 7_000,
  'Mutation.requestPasswordReset': 1_000,
  // calibrations and densities computed per request
  'Query.calibrate': 5_000,
  'Query.calibrateLuminescence': 1_000,
  'Query.calibrationCurveBand': 200,
  'Sample.calibration': 2, // stored summaries; its density is recomputed (Calibration.density)
  'Calibration.density': 200,
  'Calibration.densityGrid': 200,
  'EventPosterior.density': 50,
  'LadderEvent.density': 20,
  'RegionalEvent.combinedDensity': 100,
  'ModelCurves.density': 20,
  'ModelCurves.hazard': 20,
  'ModelCurves.survival': 20,
  // correlation checks and the ladder
  'Hypothesis.regionalEvents': 2_000,
  'Hypothesis.orderConflicts': 500,
  'Query.eventLadder': 5_000,
  // renewal fits and Monte Carlo
  'Query.fitRenewal': 5_000,
  'Query.renewalProbability': 2_000,
  // a hypothesis's regional-event check on the whole project, for one segment's table
  'Query.segmentEventTable': 3_000,
  'Query.recurrenceComparison': 200,
  // bulk writes and snapshots
  'Mutation.importSamples': 20_000,
  'Mutation.installCalibrationCurve': 20_000,
  'Mutation.createRelease': 5_000,
  'Query.releaseDiff': 2_000,
  'Mutation.startAgeModelRun': 500,
  'Mutation.startRecurrenceAnalysis': 500,
  // a joint run reads and calibrates every tied site's column and checks the hypothesis
  'Mutation.startJointAgeModelRun': 5_000,
  'JointAgeModelRun.regionalEvents': 50,
  'JointAgeModelRun.siteEvents': 50,
  'JointAgeModelRun.samples': 50,
  'JointRegionalEventPosterior.density': 50,
  // the fresh joint run of the hypothesis (one per request) and its staleness
  'RegionalEvent.jointMedianCalBp': 5,
  'RegionalEvent.jointHpd95': 5,
  'RegionalEvent.jointRun': 5,
  'RegionalEvent.ageShown': 5,
  'Hypothesis.latestJointRun': 20,
  'JointAgeModelRun.stale': 20,
  'Mutation.inviteMember': 500,
};

/**
 * Expected lengths of lists. Densities and curves are one blob each (their cost is their weight
 * above), so their points are not multiplied.
 */
const LIST_LENGTHS: Readonly<Record<string, number>> = {
  'Calibration.density': 1,
  'EventPosterior.density': 1,
  'LadderEvent.density': 1,
  'RegionalEvent.combinedDensity': 1,
  'JointRegionalEventPosterior.density': 1,
  'JointAgeModelRun.samples': 50,
  'JointAgeModelRun.siteEvents': 50,
  'JointAgeModelRun.regionalEvents': 30,
  'ModelCurves.density': 1,
  'ModelCurves.hazard': 1,
  'ModelCurves.survival': 1,
  'Query.calibrationCurveBand': 1,
  'Site.samples': 50,
  'AgeModelRun.samples': 50,
  'ReleasedSite.samples': 50,
  'ImportResult.errors': 1,
  'ImportResult.preview': 1,
  'ImportResult.columns': 1,
  // auditTrail multiplies by its own `input.first`
  'AuditConnection.edges': 1,
};

/** How many times one operation may ask for these fields (aliases and list parents included). */
export const FIELD_CAPS: Readonly<Record<string, number>> = {
  'Mutation.signIn': 1,
  'Mutation.acceptInvitation': 1,
  'Mutation.resetPassword': 1,
  'Mutation.requestPasswordReset': 1,
  'Mutation.importSamples': 1,
  'Mutation.installCalibrationCurve': 1,
  'Mutation.createRelease': 1,
  'Mutation.startJointAgeModelRun': 1,
  'Query.calibrate': 5,
  'Query.calibrateLuminescence': 10,
  'Query.fitRenewal': 3,
  'Query.renewalProbability': 5,
  'Query.eventLadder': 2,
  'Query.segmentEventTable': 2,
  'Query.releaseDiff': 2,
};

function isList(type: GraphQLOutputType): boolean {
  return isListType(isNonNullType(type) ? type.ofType : type);
}

/** What one operation costs and which capped fields it asks for how often. */
export interface OperationCost {
  cost: number;
  counts: Record<string, number>;
}

/**
 * Price an operation with the weights and list lengths above. Throws graphql's own GraphQLError
 * when the variables do not fit their types (the caller reports it as BAD_USER_INPUT).
 */
export function operationCost(
  schema: GraphQLSchema,
  document: DocumentNode,
  variables: Record<string, unknown> = {},
  operationName?: string,
): OperationCost {
  const counts: Record<string, number> = {};
  const estimator: ComplexityEstimator = ({ type, field, args, childComplexity }) => {
    const key = `${type.name}.${field.name}`;
    if (Object.hasOwn(FIELD_CAPS, key)) counts[key] = (counts[key] ?? 0) + 1;
    const weight = FIELD_WEIGHTS[key] ?? 1;
    // A connection (auditTrail) repeats its selection `input.first` times.
    if (typeof args.input?.first === 'number') return weight + args.input.first * childComplexity;
    if (!isList(field.type)) return weight + childComplexity;
    const length = (typeof args.first === 'number' ? args.first : undefined) ?? LIST_LENGTHS[key] ?? DEFAULT_LIST_LENGTH;
    // A list of scalars is one value; a list of objects repeats its selection.
    return childComplexity === 0 ? weight : weight + length * childComplexity;
  };
  const cost = getComplexity({ schema, query: document, variables, operationName, estimators: [estimator] });
  return { cost, counts };
}

/** Whether a priced operation is allowed: the first cap it breaks, or undefined. */
export function costRefusal({ cost, counts }: OperationCost, maximum = MAX_OPERATION_COST): string | undefined {
  for (const [key, count] of Object.entries(counts)) {
    if (count > FIELD_CAPS[key]) {
      const name = key.split('.')[1];
      return `this request asks for ${name} ${count} times; one request may ask for it at most ${FIELD_CAPS[key]} ${FIELD_CAPS[key] === 1 ? 'time' : 'times'}`;
    }
  }
  if (cost > maximum) {
    return `this request would cost ${Math.round(cost)} units; the limit is ${maximum}: ask for fewer fields, aliases or list items, or split it into several requests`;
  }
  return undefined;
}

function refusal(message: string): GraphQLError {
  return new GraphQLError(message, { extensions: { code: 'BAD_USER_INPUT', field: 'query', http: { status: 400 } } });
}

/**
 * The cost model as an Apollo plugin: it runs after the operation and its variables are known
 * (a plain validation rule cannot see variables) and before any resolver. Refusals are HTTP 400
 * `BAD_USER_INPUT`; so are variables that do not fit their types, which the pricing meets first.
 * Answers larger than `maxAnswerBytes` are replaced by a refusal as they are sent.
 */
export function costLimitPlugin(maximum = MAX_OPERATION_COST, maxAnswerBytes = MAX_ANSWER_BYTES): ApolloServerPlugin {
  return {
    async requestDidStart() {
      return {
        async didResolveOperation({ request, document, schema }) {
          let priced: OperationCost;
          try {
            priced = operationCost(schema, document, request.variables ?? {}, request.operationName ?? undefined);
          } catch (error) {
            if (error instanceof GraphQLError) {
              throw new GraphQLError(error.message, { nodes: error.nodes, extensions: { code: 'BAD_USER_INPUT', http: { status: 400 } } });
            }
            throw error;
          }
          const message = costRefusal(priced, maximum);
          if (message) throw refusal(message);
        },
        async willSendResponse({ response }) {
          if (response.body.kind !== 'single') return;
          const bytes = Buffer.byteLength(answerJson(response.body.singleResult));
          if (bytes <= maxAnswerBytes) return;
          response.http.status = 400;
          response.body.singleResult = {
            errors: [
              {
                message: `the answer would be ${(bytes / 1048576).toFixed(1)} MB; the limit is ${Math.round(maxAnswerBytes / 1048576)} MB: ask for fewer fields or a narrower range`,
                extensions: { code: 'BAD_USER_INPUT', field: 'query' },
              },
            ],
          };
        },
      };
    },
  };
}
