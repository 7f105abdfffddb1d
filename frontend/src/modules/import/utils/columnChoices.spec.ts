import { describe, expect, it } from 'vitest';
import { choicesInput, choiceValueOf, IGNORE, problemPlace, UNCHOSEN, withChoice } from './columnChoices';

// The meaning of the choices is the API's (schema.graphql: ImportSamplesInput.columnChoices,
// a field name or null to ignore the column; ImportProblemScope).

describe(choiceValueOf.name, () => {
  it('shows the server reading until the user chooses, and a blank choice for an unknown header', () => {
    expect(choiceValueOf({ header: 'Method', field: 'method', source: 'NAME' }, {})).toBe('method');
    expect(choiceValueOf({ header: 'Lab ID', field: null, source: 'UNKNOWN' }, {})).toBe(UNCHOSEN);
    expect(choiceValueOf({ header: 'Notes 2', field: null, source: 'REMEMBERED' }, {})).toBe(IGNORE);
    expect(choiceValueOf({ header: 'Lab ID', field: null, source: 'UNKNOWN' }, { 'Lab ID': 'labCode' })).toBe('labCode');
    expect(choiceValueOf({ header: 'Lab ID', field: null, source: 'UNKNOWN' }, { 'Lab ID': null })).toBe(IGNORE);
  });
});

describe(withChoice.name, () => {
  it('sends a field, null for an ignored column, and nothing for a forgotten choice', () => {
    let choices = withChoice({}, 'Lab ID', 'labCode');
    choices = withChoice(choices, '±', IGNORE);
    expect(choicesInput(choices)).toEqual([{ header: 'Lab ID', field: 'labCode' }, { header: '±', field: null }]);
    expect(choicesInput(withChoice(choices, 'Lab ID', UNCHOSEN))).toEqual([{ header: '±', field: null }]);
  });
});

describe(problemPlace.name, () => {
  it('says Header or Sheet rather than row 0', () => {
    expect(problemPlace({ row: 0, scope: 'HEADER' })).toBe('Header');
    expect(problemPlace({ row: 0, scope: 'SHEET' })).toBe('Sheet');
    expect(problemPlace({ row: 12, scope: 'ROW' })).toBe('Row 12');
  });
});
