/**
 * parseWorksheetYaml: a worksheet file is validated and its problems name the file, field and line.
 */
import { parseWorksheetYaml, WorksheetFileError } from './load';

const GOOD = `name: tiny
title: A tiny sheet
inputs:
  - name: P
    label: Power
    unit: W
    default: 1 kW
steps:
  - name: F
    label: Bound
    expression: P / c
`;

function fileError(text: string, file = 'tiny.yml'): WorksheetFileError {
  try {
    parseWorksheetYaml(text, file);
  } catch (e) {
    expect(e).toBeInstanceOf(WorksheetFileError);
    return e as WorksheetFileError;
  }
  throw new Error('expected a WorksheetFileError');
}

test('a valid file gives the parsed worksheet with schema defaults', () => {
  const ws = parseWorksheetYaml(GOOD, 'tiny.yml');
  expect(ws.name).toBe('tiny');
  expect(ws.steps[0].expression).toBe('P / c');
  expect(ws.checks).toEqual([]);
  expect(ws.plots).toEqual([]);
});

test('a schema problem names the file, the field path and the line', () => {
  const e = fileError(GOOD.replace('name: P', 'name: 9P'));
  expect(e.problems[0].field).toBe('worksheet.inputs.0.name');
  expect(e.problems[0].line).toBe(4);
  expect(e.message).toContain('tiny.yml:4: worksheet.inputs.0.name:');
});

test('an expression problem is found at its line', () => {
  const e = fileError(GOOD.replace('expression: P / c', 'expression: Pp / c'));
  expect(e.problems).toHaveLength(1);
  expect(e.problems[0].field).toBe('worksheet.steps.0.expression');
  expect(e.problems[0].line).toBe(11);
  expect(e.problems[0].message).toContain('"Pp" is not an input, a step or a constant');
  expect(e.message).toMatch(/^tiny\.yml: a problem in this worksheet/);
});

test('a missing field points at its parent', () => {
  const e = fileError(GOOD.replace('    default: 1 kW\n', ''));
  expect(e.problems[0].field).toBe('worksheet.inputs.0.default');
  expect(e.problems[0].line).toBe(4); // the input's mapping starts on line 4
});

test('YAML syntax errors name the file and line', () => {
  const e = fileError('name: tiny\ntitle: [unclosed\nsteps: []\n', 'broken.yml');
  expect(e.fileName).toBe('broken.yml');
  expect(e.problems[0].field).toBe('yaml');
  expect(e.problems[0].line).toBeGreaterThanOrEqual(2);
  expect(e.message).toContain('broken.yml');
});

test('a dimension error at the defaults is reported at the expression', () => {
  const e = fileError(GOOD.replace('expression: P / c', 'expression: P + c'));
  expect(e.problems[0].field).toBe('worksheet.steps.0.expression');
  expect(e.problems[0].message).toContain('cannot add a power (watts) and a speed (m/s)');
});
