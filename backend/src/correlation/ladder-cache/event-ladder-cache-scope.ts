/**
 * Which operations the event-ladder answer cache may keep: those whose every selected field is
 * covered by the project data revision (`EventLadderCache.state`), i.e. read only from the sites,
 * their units, event horizons, segments and age model runs, the project row and its hypotheses'
 * own rows. A field outside this list (samples, attachments, members, releases, ties, ...)
 * could change without moving the revision, so an operation asking for it is never cached.
 * Plain functions over the GraphQL document; no I/O.
 */
import type { FieldNode, FragmentDefinitionNode, GraphQLObjectType, GraphQLSchema, OperationDefinitionNode, SelectionSetNode } from 'graphql';

// Types are told apart by name and shape, never by graphql-js's instanceof helpers: the schema
// comes from Apollo's copy of graphql, which under the test runner may be another module instance.
const FIELD = 'Field';
const FRAGMENT_SPREAD = 'FragmentSpread';

/** The object type called `name` (after list and non-null wrappers are stripped), if it is one. */
function objectType(schema: GraphQLSchema, name: string): GraphQLObjectType | undefined {
  const type = schema.getType(name.replace(/[[\]!]/g, ''));
  // Output fields name object or interface types (input types never); interfaces are in no COVERED entry.
  return type && 'getFields' in type ? (type as GraphQLObjectType) : undefined;
}

/** Fields by type that the revision covers. */
const COVERED: Readonly<Record<string, ReadonlySet<string>>> = Object.fromEntries(
  Object.entries({
    Query: ['eventLadder', 'project'],
    EventLadder: ['project', 'columns'],
    LadderColumn: ['site', 'latestAgeModelRun', 'events'],
    LadderEvent: ['eventHorizon', 'medianCalBp', 'hpd95', 'densityGrid', 'density'],
    // Units, event horizons and samples move `sites.column_revision`; samples are still left out
    // because their calibrations also depend on installed curves.
    Site: ['id', 'version', 'name', 'kind', 'latitude', 'longitude', 'alongStrikeKm', 'elevationM', 'waterDepthM', 'notes', 'segment', 'units', 'eventHorizons', 'latestAgeModelRun', 'ageModelRuns'],
    Segment: ['id', 'version', 'name', 'startKm', 'endKm', 'notes'],
    Unit: ['id', 'version', 'position', 'name', 'topDepthM', 'baseDepthM', 'facies', 'basalErosionM', 'notes'],
    EventHorizon: ['id', 'version', 'name', 'unitBelow', 'unitAbove', 'quality', 'evidence', 'notes', 'latestPosterior'],
    AgeModelRun: ['id', 'status', 'progress', 'message', 'seed', 'settings', 'stale', 'createdAt', 'finishedAt', 'diagnostics'],
    AgeModelDiagnostics: ['converged', 'maxRhat', 'minEss', 'message'],
    EventPosterior: ['medianCalBp', 'meanCalBp', 'hpd68', 'hpd95', 'rhat', 'ess', 'density'],
    HpdRange: ['olderCalBp', 'youngerCalBp', 'probability'],
    DensityGrid: ['startCalBp', 'stepYears', 'values'],
    DensityPoint: ['calBp', 'probability'],
    Project: ['id', 'name', 'description', 'tectonicSetting', 'myRole', 'myPermissions', 'hypotheses'],
    Hypothesis: ['id', 'name', 'description', 'preferred', 'version', 'createdAt'],
  }).map(([type, fields]) => [type, new Set(fields)]),
);

/** True when every field the operation selects, through fragments too, is covered by the revision. */
export function coveredByLadderRevision(
  schema: GraphQLSchema,
  operation: OperationDefinitionNode,
  fragments: Readonly<Record<string, FragmentDefinitionNode>>,
): boolean {
  if (operation.operation !== 'query') return false;
  const root = schema.getQueryType();
  return root !== null && root !== undefined && covered(schema, root, operation.selectionSet, fragments, new Set());
}

function covered(
  schema: GraphQLSchema,
  type: GraphQLObjectType,
  selectionSet: SelectionSetNode,
  fragments: Readonly<Record<string, FragmentDefinitionNode>>,
  visiting: Set<string>,
): boolean {
  for (const selection of selectionSet.selections) {
    if (selection.kind === FIELD) {
      if (!coveredField(schema, type, selection, fragments, visiting)) return false;
      continue;
    }
    const fragment = selection.kind === FRAGMENT_SPREAD ? fragments[selection.name.value] : selection;
    if (!fragment) return false;
    if (selection.kind === FRAGMENT_SPREAD) {
      // A fragment that spreads itself is invalid GraphQL; refusing it here is enough.
      if (visiting.has(selection.name.value)) return false;
      visiting.add(selection.name.value);
    }
    const condition = fragment.typeCondition ? fragment.typeCondition.name.value : type.name;
    const ok = condition === type.name && covered(schema, type, fragment.selectionSet, fragments, visiting);
    if (selection.kind === FRAGMENT_SPREAD) visiting.delete(selection.name.value);
    if (!ok) return false;
  }
  return true;
}

function coveredField(
  schema: GraphQLSchema,
  type: GraphQLObjectType,
  field: FieldNode,
  fragments: Readonly<Record<string, FragmentDefinitionNode>>,
  visiting: Set<string>,
): boolean {
  const name = field.name.value;
  if (name === '__typename') return true;
  if (!COVERED[type.name]?.has(name)) return false;
  const definition = type.getFields()[name];
  if (!definition) return false;
  if (!field.selectionSet) return true;
  const named = objectType(schema, String(definition.type));
  return named !== undefined && covered(schema, named, field.selectionSet, fragments, visiting);
}
