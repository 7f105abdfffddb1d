import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import {
  buildSchema,
  GraphQLInputType,
  GraphQLSchema,
  isEnumType,
  isInputObjectType,
  isListType,
  isNonNullType,
  OperationDefinitionNode,
  parse,
  typeFromAST,
} from 'graphql';
import { describe, expect, it } from 'vitest';
import { costRefusal, FIELD_CAPS, MAX_OPERATION_COST, operationCost } from './graphql-cost';
import { repositoryRoot } from './repo-paths';

const schema = buildSchema(readFileSync(join(repositoryRoot(), 'schema.graphql'), 'utf8'));

/** A value of the right type for a required variable (the cost model only reads `first`). */
function sampleValue(type: GraphQLInputType): unknown {
  if (isNonNullType(type)) return sampleValue(type.ofType);
  if (isListType(type)) return [sampleValue(type.ofType)];
  if (isInputObjectType(type)) {
    return Object.fromEntries(
      Object.values(type.getFields())
        .filter((field) => isNonNullType(field.type))
        .map((field) => [field.name, sampleValue(field.type)]),
    );
  }
  if (isEnumType(type)) return type.getValues()[0].value;
  switch (type.name) {
    case 'ID':
      return '00000000-0000-4000-8000-000000000000';
    case 'Int':
    case 'Float':
      return 1;
    case 'Boolean':
      return true;
    case 'NumberList':
      return [1];
    default:
      return 'x';
  }
}

function variablesFor(operation: OperationDefinitionNode, target: GraphQLSchema): Record<string, unknown> {
  const values: Record<string, unknown> = {};
  for (const definition of operation.variableDefinitions ?? []) {
    const type = typeFromAST(target, definition.type) as GraphQLInputType;
    if (isNonNullType(type)) values[definition.variable.name.value] = sampleValue(type);
  }
  return values;
}

/** Every operation the UI sends, from the generated documents (`npm run codegen -w frontend`). */
function screenOperations(): { name: string; text: string }[] {
  const generated = readFileSync(join(repositoryRoot(), 'frontend', 'src', 'gql', 'graphql.ts'), 'utf8');
  const operations: { name: string; text: string }[] = [];
  for (const match of generated.matchAll(/export const (\w+)Document = new TypedDocumentString\(`([\s\S]*?)`/g)) {
    operations.push({ name: match[1], text: match[2] });
  }
  return operations;
}

describe('operationCost', () => {
  const price = (query: string, variables: Record<string, unknown> = {}) => operationCost(schema, parse(query), variables);

  it('prices every screen query well inside the cap', () => {
    const operations = screenOperations();
    expect(operations.length).toBeGreaterThan(40);
    for (const { name, text } of operations) {
      const document = parse(text);
      const operation = document.definitions.find((d): d is OperationDefinitionNode => d.kind === 'OperationDefinition')!;
      const priced = operationCost(schema, document, variablesFor(operation, schema));
      if (process.env.PRINT_COSTS) process.stderr.write(`COST ${name} ${priced.cost}\n`);
      expect(costRefusal(priced), name).toBeUndefined();
      expect(priced.cost, name).toBeLessThan(MAX_OPERATION_COST / 2);
    }
  });

  it('multiplies a list selection by its expected length and by `first`', () => {
    const one = price('{ projects { id } }').cost;
    const deeper = price('{ projects { sites { id } } }').cost;
    // projects (20) x (sites field + 20 x id)
    expect(one).toBe(1 + 20 * 1);
    expect(deeper).toBe(1 + 20 * (1 + 20 * 1));
    const page = (first: number) =>
      price('query($f: Int) { auditTrail(input: { projectId: "00000000-0000-4000-8000-000000000000", first: $f }) { edges { cursor } } }', { f: first }).cost;
    expect(page(100)).toBeGreaterThan(page(10) * 5);
  });

  it('weighs computing fields above plain ones', () => {
    const plain = price('{ me { id } }').cost;
    const calibration = price('{ calibrate(input: { c14Age: 1000, c14Error: 30, curve: INTCAL20 }) { medianCalBp } }').cost;
    expect(calibration).toBeGreaterThan(100 * plain);
  });

  it('counts aliases of capped fields and refuses above the cap', () => {
    const aliases = (n: number) =>
      `{ ${Array.from({ length: n }, (_, i) => `c${i}: calibrate(input: { c14Age: 1000, c14Error: 1000000, curve: INTCAL20 }) { density { calBp } }`).join(' ')} }`;
    expect(costRefusal(price(aliases(FIELD_CAPS['Query.calibrate'])))).toBeUndefined();
    expect(costRefusal(price(aliases(20)))).toMatch(/calibrate 20 times; .* at most 5 times/);
    const signIns = 'mutation { a: signIn(email: "a@b.c", password: "x") { token } b: signIn(email: "a@b.c", password: "y") { token } }';
    expect(costRefusal(price(signIns))).toMatch(/signIn 2 times; .* at most 1 time$/);
  });

  it('refuses an operation above the total cap', () => {
    const hypotheses = `{ ${Array.from({ length: 100 }, (_, i) => `h${i}: hypothesis(id: "00000000-0000-4000-8000-000000000000") { regionalEvents { id } }`).join(' ')} }`;
    expect(costRefusal(price(hypotheses))).toMatch(/would cost \d+ units; the limit is 100000/);
  });

  it('throws graphql coercion errors for variables that do not fit (reported as BAD_USER_INPUT by the plugin)', () => {
    expect(() => price('query($t: TectonicSetting!) { projects { id } }', { t: 'NOPE' })).toThrow(/does not exist in "TectonicSetting" enum/);
  });
});
