import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestServer, TestServer } from '../support/app';
import { randomUUID } from 'node:crypto';
import { createProjectFixture, createUser, PASSWORD, ProjectFixture, sql } from '../support/fixtures';
import { GraphqlClient } from '../support/graphql';

const CALIBRATE = `query($i: CalibrateInput!) { calibrate(input: $i) { medianCalBp meanCalBp
  hpd68 { olderCalBp youngerCalBp probability } hpd95 { olderCalBp youngerCalBp probability }
  density { calBp probability } warnings } }`;
const LUMINESCENCE = `query($i: CalibrateLuminescenceInput!) { calibrateLuminescence(input: $i) { medianCalBp hpd95 { olderCalBp youngerCalBp probability } } }`;
const INSTALL = `mutation($i: InstallCurveInput!) { installCalibrationCurve(input: $i) { code name marine builtIn youngestCalBp oldestCalBp } }`;

/**
 * The linear test curve of CHECKS.md: mu(t) = t, sigma 20, tabulated every 10 years over 0-3000 cal BP
 * (an invented curve for the check, installed under the SHCAL20 code in this throwaway database).
 */
function linearCurveFile(): string {
  const rows = ['cal_bp,c14_age,c14_sigma,delta14c,delta14c_sigma'];
  for (let t = 3000; t >= 0; t -= 10) rows.push(`${t},${t},20,0,1`);
  return rows.join('\n');
}

let server: TestServer;
let fixture: ProjectFixture;
let viewer: GraphqlClient;
let admin: GraphqlClient;
/** An operator of the server (OPERATOR_EMAILS), member of no project. */
let operator: GraphqlClient;
const OPERATOR_EMAIL = `operator-${randomUUID().slice(0, 8)}@calibration.test`;

beforeAll(async () => {
  // Installed curves are server-wide; start from none, as a fresh database does.
  await sql(`delete from calibration_curves where code = 'SHCAL20'`);
  server = await startTestServer({ OPERATOR_EMAILS: `someone-else@calibration.test, ${OPERATOR_EMAIL.toUpperCase()}` });
  fixture = await createProjectFixture('Calibration');
  await createUser(OPERATOR_EMAIL, 'Calibration operator');
  operator = await new GraphqlClient(server.url).signIn(OPERATOR_EMAIL, PASSWORD);
  viewer = await new GraphqlClient(server.url).signIn(fixture.emails.VIEWER, PASSWORD);
  admin = await new GraphqlClient(server.url).signIn(fixture.emails.ADMIN, PASSWORD);
});

afterAll(async () => {
  await server?.close();
});

describe('calibrate', () => {
  it('answers a normalised IntCal20 density with ranges for any signed-in user', async () => {
    // SOURCES.md spot value: IntCal20 gives 1126 +- 13 14C yr BP at 1000 cal BP [published].
    const { calibrate } = await viewer.ok(CALIBRATE, { i: { c14Age: 1126, c14Error: 13, curve: 'INTCAL20' } });
    const mass = calibrate.density.reduce((sum: number, p: { probability: number }) => sum + p.probability, 0);
    expect(mass).toBeCloseTo(1, 5);
    expect(calibrate.hpd95.some((r: { olderCalBp: number; youngerCalBp: number }) => r.olderCalBp >= 1000 && r.youngerCalBp <= 1000)).toBe(true);
    // The contract lists only the grid years holding more than 1e-6 of the total.
    expect(calibrate.density.every((p: { probability: number }) => p.probability > 1e-6)).toBe(true);
    expect(calibrate.medianCalBp).toBeGreaterThan(900);
    expect(calibrate.medianCalBp).toBeLessThan(1100);
  });

  it('gives the density as a compact grid for drawing: 1-year bins for a usual error, pooled bins of the same area for the widest', async () => {
    const GRID = `query($i: CalibrateInput!) { calibrate(input: $i) { density { calBp probability } densityGrid { startCalBp stepYears values } } }`;
    type Answer = { calibrate: { density: { calBp: number; probability: number }[]; densityGrid: { startCalBp: number; stepYears: number; values: number[] } } };
    const usual = (await viewer.ok<Answer>(GRID, { i: { c14Age: 1126, c14Error: 13, curve: 'INTCAL20' } })).calibrate;
    // Same years as the listed points, same probabilities to the grid's 4 significant figures.
    expect(usual.densityGrid.stepYears).toBe(1);
    expect(usual.densityGrid.startCalBp).toBe(usual.density[0].calBp);
    const byYear = new Map(usual.density.map((p) => [p.calBp, p.probability]));
    usual.densityGrid.values.forEach((value, i) => {
      const point = byYear.get(usual.densityGrid.startCalBp + i) ?? 0;
      expect(Math.abs(value - point)).toBeLessThanOrEqual(Math.max(point * 5e-4, 1e-6));
    });
    // The widest allowed error: at most 2,000 values, wider bins, and the area still 1 (values
    // are probability per year, so area = sum x step) [analytic].
    const GRID_ONLY = `query($i: CalibrateInput!) { calibrate(input: $i) { densityGrid { startCalBp stepYears values } } }`;
    const wide = (await viewer.ok<{ calibrate: Pick<Answer['calibrate'], 'densityGrid'> }>(GRID_ONLY, { i: { c14Age: 3000, c14Error: 20000, curve: 'INTCAL20' } })).calibrate.densityGrid;
    expect(wide.values.length).toBeLessThanOrEqual(2000);
    expect(wide.values.length).toBeGreaterThan(1000);
    expect(wide.stepYears).toBeGreaterThan(1);
    expect(wide.values.reduce((sum, v) => sum + v, 0) * wide.stepYears).toBeCloseTo(1, 2);
  });

  it('refuses what cannot be calibrated, naming the field', async () => {
    const cases: [Record<string, unknown>, string][] = [
      [{ c14Age: 1000, c14Error: 0, curve: 'INTCAL20' }, 'c14Error'],
      [{ c14Age: -50, c14Error: 20, curve: 'INTCAL20' }, 'c14Age'],
      [{ c14Age: 80_000, c14Error: 100, curve: 'INTCAL20' }, 'c14Age'],
      [{ c14Age: 1000, c14Error: 20, curve: 'INTCAL20', deltaR: 50, deltaRError: 20 }, 'deltaR'],
      [{ c14Age: 1000, c14Error: 20, curve: 'MARINE20' }, 'deltaR'],
    ];
    for (const [input, field] of cases) {
      expect(await viewer.errorOf(CALIBRATE, { i: input }), JSON.stringify(input)).toMatchObject({ code: 'BAD_USER_INPUT', field });
    }
  });

  it('warns that Marine20 is not meant for polar waters above 60 degrees', async () => {
    const input = { c14Age: 1620, c14Error: 30, curve: 'MARINE20', deltaR: 0, deltaRError: 0 };
    const temperate = (await viewer.ok(CALIBRATE, { i: { ...input, latitude: 45 } })).calibrate;
    const polar = (await viewer.ok(CALIBRATE, { i: { ...input, latitude: 71 } })).calibrate;
    expect(temperate.warnings.join(' ')).not.toMatch(/polar/);
    expect(polar.warnings.join(' ')).toMatch(/polar/);
  });

  it('turns a luminescence age into cal BP counting from its measurement year', async () => {
    // CHECKS.md: 1075 +- 70 a measured in 2019 -> 1075 - (2019 - 1950) = 1006 cal BP (944 CE; the
    // published table rounds to 945 CE) [published, arithmetic].
    const { calibrateLuminescence } = await viewer.ok(LUMINESCENCE, { i: { ageYears: 1075, errorYears: 70, measurementYear: 2019 } });
    expect(calibrateLuminescence.medianCalBp).toBeCloseTo(1006, 0);
    const [range] = calibrateLuminescence.hpd95;
    expect(range.olderCalBp - range.youngerCalBp).toBeGreaterThan(270);
    expect(range.olderCalBp - range.youngerCalBp).toBeLessThan(290);
  });
});

describe('installCalibrationCurve', () => {
  it('answers BAD_USER_INPUT for SHCAL20 before it is installed', async () => {
    const error = await viewer.errorOf(CALIBRATE, { i: { c14Age: 1000, c14Error: 30, curve: 'SHCAL20' } });
    expect(error).toMatchObject({ code: 'BAD_USER_INPUT', field: 'curve' });
    expect(error.message).toMatch(/not installed/);
  });

  it('is refused to every project role, a project ADMIN too, and refuses a malformed file', async () => {
    const input = { code: 'SHCAL20', name: 'Linear test curve', marine: false, text: linearCurveFile() };
    // A curve serves every project on the server: a project's ADMIN may not change it for others.
    for (const client of [viewer, admin]) {
      const error = await client.errorOf(INSTALL, { i: input });
      expect(error.code).toBe('FORBIDDEN');
      expect(error.message).toMatch(/operator/);
    }
    expect(await sql(`select 1 from calibration_curves where code = 'SHCAL20'`)).toHaveLength(0);
    const unordered = { ...input, text: 'cal_bp,c14_age,c14_sigma\n100,100,20\n100,90,20\n' };
    expect(await operator.errorOf(INSTALL, { i: unordered })).toMatchObject({ code: 'BAD_USER_INPUT', field: 'text' });
    const badSigma = { ...input, text: 'cal_bp,c14_age,c14_sigma\n100,100,0\n90,90,20\n' };
    expect(await operator.errorOf(INSTALL, { i: badSigma })).toMatchObject({ code: 'BAD_USER_INPUT', field: 'text' });
  });

  it('says who is an operator', async () => {
    expect((await operator.ok(`{ me { operator } }`)).me.operator).toBe(true);
    expect((await admin.ok(`{ me { operator } }`)).me.operator).toBe(false);
  });

  it('installs a curve that is then used like a built-in (the linear check of CHECKS.md)', async () => {
    const { installCalibrationCurve } = await operator.ok(INSTALL, {
      i: { code: 'SHCAL20', name: 'Linear test curve', marine: false, text: linearCurveFile() },
    });
    expect(installCalibrationCurve).toMatchObject({ code: 'SHCAL20', builtIn: false, youngestCalBp: 0, oldestCalBp: 3000 });
    const { calibrate } = await viewer.ok(CALIBRATE, { i: { c14Age: 1000, c14Error: 30, curve: 'SHCAL20' } });
    // CHECKS.md [analytic]: combined sigma sqrt(30^2 + 20^2) = 36.06; 68.3 % HPD about 964-1036,
    // 95.4 % about 928-1071, each within a year.
    expect(calibrate.medianCalBp).toBeCloseTo(1000, 0);
    expect(calibrate.hpd68).toHaveLength(1);
    expect(Math.abs(calibrate.hpd68[0].youngerCalBp - 964)).toBeLessThanOrEqual(1);
    expect(Math.abs(calibrate.hpd68[0].olderCalBp - 1036)).toBeLessThanOrEqual(1);
    expect(Math.abs(calibrate.hpd95[0].youngerCalBp - 928)).toBeLessThanOrEqual(1);
    expect(Math.abs(calibrate.hpd95[0].olderCalBp - 1071)).toBeLessThanOrEqual(1);
    const { calibrationCurves } = await viewer.ok(`{ calibrationCurves { code builtIn } }`);
    expect(calibrationCurves).toEqual(expect.arrayContaining([{ code: 'INTCAL20', builtIn: true }, { code: 'SHCAL20', builtIn: false }]));
  });
});
