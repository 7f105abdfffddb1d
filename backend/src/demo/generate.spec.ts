import { beforeAll, describe, expect, it } from 'vitest';
import { jStat } from '../chronology/common/jstat';
import { builtInCurve } from '../reference-data/reference-data';
import { DEMO_SEED, DemoCurves, DemoScenario, DemoSite, DemoUnit, depositAgeAt, generateDemoScenario } from './generate';
import { VELMORA_GEOMETRY } from './truth';


let curves: DemoCurves;
let scenario: DemoScenario;

beforeAll(() => {
  curves = { intcal20: builtInCurve('INTCAL20'), marine20: builtInCurve('MARINE20') };
  scenario = generateDemoScenario(DEMO_SEED, curves);
});

function allSites(s: DemoScenario): DemoSite[] {
  return [...s.sites, ...s.secondProject.sites];
}

function unitOf(site: DemoSite, key: string): DemoUnit {
  const unit = site.units.find((u) => u.key === key);
  if (!unit) throw new Error(`${site.key}: no unit ${key}`);
  return unit;
}

/** Great-circle distance by the haversine formula, written out here independently of truth.ts [analytic]. */
function haversineKm(lat1: number, lon1: number, lat2: number, lon2: number): number {
  const rad = Math.PI / 180;
  const a =
    Math.sin(((lat2 - lat1) * rad) / 2) ** 2 +
    Math.cos(lat1 * rad) * Math.cos(lat2 * rad) * Math.sin(((lon2 - lon1) * rad) / 2) ** 2;
  return 2 * 6371.0088 * Math.asin(Math.sqrt(a));
}

describe(generateDemoScenario.name, () => {
  it('is deterministic for a seed and varies the measurements with it', () => {
    const again = generateDemoScenario(DEMO_SEED, curves);
    expect(again).toEqual(scenario);
    expect(generateDemoScenario(undefined, curves)).toEqual(scenario);

    const other = generateDemoScenario(DEMO_SEED + 1, curves);
    expect(other.trueEvents).toEqual(scenario.trueEvents);
    const ages = (s: DemoScenario) => s.sites.flatMap((site) => site.samples.map((x) => x.c14Age ?? x.calendarAgeBp));
    expect(ages(other)).not.toEqual(ages(scenario));
  });

  it('builds the counts the demo needs', () => {
    expect(scenario.project).toMatchObject({ name: 'Velmora Margin', tectonicSetting: 'SUBDUCTION_INTERFACE' });
    expect(scenario.segments.map((s) => s.key)).toEqual(['NORTH', 'CENTRAL', 'SOUTH']);
    expect(scenario.segments[0].startKm).toBe(0);
    expect(scenario.segments[2].endKm).toBe(600);
    expect(scenario.sites.filter((s) => s.kind !== 'CORE')).toHaveLength(8);
    expect(scenario.sites.filter((s) => s.kind === 'CORE')).toHaveLength(6);
    expect(new Set(scenario.sites.filter((s) => s.kind !== 'CORE').map((s) => s.kind))).toEqual(
      new Set(['MARSH', 'LAKE', 'TRENCH', 'OUTCROP']),
    );
    const sampleCount = scenario.sites.reduce((n, s) => n + s.samples.length, 0);
    expect(sampleCount).toBeGreaterThanOrEqual(70);
    expect(sampleCount).toBeLessThanOrEqual(95);
    for (const site of scenario.sites) {
      expect(site.eventHorizons.length, site.key).toBeGreaterThanOrEqual(3);
      expect(site.eventHorizons.length, site.key).toBeLessThanOrEqual(8);
    }
    expect(scenario.trueEvents).toHaveLength(11);
    for (const e of scenario.trueEvents) {
      expect(e.calBp).toBeGreaterThan(0);
      expect(e.calBp).toBeLessThan(6000);
    }
    for (let seed = 1; seed <= 5; seed++) {
      const s = generateDemoScenario(seed, curves);
      expect(s.sites.reduce((n, site) => n + site.eventHorizons.length, 0)).toBe(
        scenario.sites.reduce((n, site) => n + site.eventHorizons.length, 0),
      );
    }
  });

  it('names the five demo accounts with their roles', () => {
    expect(scenario.people.map((p) => [p.email, p.role])).toEqual([
      ['admin@demo.test', 'ADMIN'],
      ['researcher@demo.test', 'RESEARCHER'],
      ['correlator@demo.test', 'CORRELATOR'],
      ['analyst@demo.test', 'ANALYST'],
      ['viewer@demo.test', 'VIEWER'],
    ]);
    for (const p of scenario.people) expect(p.name.trim().length).toBeGreaterThan(3);
  });

  it('has a true history with mean recurrence near 500 years and aperiodicity near 0.4', () => {
    const ages = scenario.trueEvents.map((e) => e.calBp).sort((a, b) => a - b);
    const intervals = ages.slice(1).map((t, i) => t - ages[i]);
    // jstat as the reference library; sample standard deviation (n - 1).
    const mean = jStat.mean(intervals);
    const cv = jStat.stdev(intervals, true) / mean;
    expect(mean).toBeGreaterThanOrEqual(400);
    expect(mean).toBeLessThanOrEqual(600);
    expect(cv).toBeGreaterThanOrEqual(0.25);
    expect(cv).toBeLessThanOrEqual(0.55);
    // By hand from truth.ts's listed intervals: mean 503.5, sample SD 207.7 [analytic].
    expect(mean).toBeCloseTo(503.5, 6);
    expect(cv).toBeCloseTo(207.68 / 503.5, 3);

    const only = (key: string) => scenario.trueEvents.filter((e) => e.segmentKeys.length === 1 && e.segmentKeys[0] === key);
    expect(only('SOUTH')).toHaveLength(2);
    expect(only('NORTH')).toHaveLength(1);
    expect(scenario.trueEvents.filter((e) => e.segmentKeys.length === 3)).toHaveLength(8);
    for (const e of only('SOUTH')) expect([e.alongStrikeFromKm, e.alongStrikeToKm]).toEqual([400, 600]);
  });

  it('keeps every column in order: positions, depths and true ages', () => {
    for (const site of allSites(scenario)) {
      const units = site.units;
      units.forEach((u, i) => {
        expect(u.position, site.key).toBe(i + 1);
        expect(u.topDepthM, `${site.key} ${u.key}`).toBeLessThan(u.baseDepthM);
        expect(u.truth.topCalBp).toBeLessThanOrEqual(u.truth.baseCalBp);
        if (i > 0) {
          // The unit above a unit is shallower, touches it, and is not older.
          expect(units[i - 1].topDepthM).toBe(u.baseDepthM);
          expect(u.truth.baseCalBp).toBeLessThanOrEqual(units[i - 1].truth.topCalBp);
        }
      });
      expect(units[units.length - 1].topDepthM).toBe(0);
      expect(new Set(units.map((u) => u.key)).size).toBe(units.length);
    }
  });

  it('puts every event horizon between adjacent units that hold the event', () => {
    for (const site of allSites(scenario)) {
      const prefix = site.kind === 'CORE' ? 'T' : 'E';
      expect(site.eventHorizons.map((h) => h.name)).toEqual(site.eventHorizons.map((_h, i) => `${prefix}${i + 1}`));
      let previousPosition = Infinity;
      for (const h of site.eventHorizons) {
        const below = unitOf(site, h.unitBelowKey);
        const above = unitOf(site, h.unitAboveKey);
        expect(above.position, `${site.key} ${h.name}`).toBe(below.position + 1);
        expect(above.position).toBeLessThan(previousPosition); // youngest first
        previousPosition = above.position;
        expect(above.truth.trueEventKey).toBe(h.trueEventKey);
        const event = [...scenario.trueEvents, ...scenario.secondProject.trueEvents].find((e) => e.key === h.trueEventKey);
        expect(event, h.trueEventKey).toBeDefined();
        expect(above.truth.baseCalBp).toBe(event?.calBp);
        expect(below.truth.topCalBp).toBeGreaterThanOrEqual(event?.calBp ?? NaN);
        expect([1, 2, 3, 4]).toContain(h.quality);
        expect(h.evidence.length).toBeGreaterThan(0);
      }
    }
  });

  it('records each event only where its rupture reached, and loses only the eroded one', () => {
    const missing: { site: DemoSite; key: string }[] = [];
    for (const site of scenario.sites) {
      const expected = scenario.trueEvents
        .filter(
          (e) =>
            e.alongStrikeFromKm <= site.alongStrikeKm &&
            site.alongStrikeKm <= e.alongStrikeToKm &&
            e.calBp > site.truth.recordYoungCalBp &&
            e.calBp < site.truth.recordOldCalBp,
        )
        .map((e) => e.key);
      const recorded = site.eventHorizons.map((h) => h.trueEventKey);
      for (const key of recorded) expect(expected, `${site.key} records ${key}`).toContain(key);
      for (const key of expected.filter((k) => !recorded.includes(k))) missing.push({ site, key });
      expect(site.truth.missingEvents.map((m) => m.trueEventKey)).toEqual(expected.filter((k) => !recorded.includes(k)));
    }
    expect(missing.map((m) => [m.site.key, m.key])).toEqual([['merrowick-marsh', 'V2']]);
    // The nearest sites on both sides record the event the erosion removed.
    const byKm = [...scenario.sites].sort((a, b) => a.alongStrikeKm - b.alongStrikeKm);
    const at = byKm.findIndex((s) => s.key === 'merrowick-marsh');
    for (const neighbour of [byKm[at - 1], byKm[at + 1]]) {
      expect(neighbour.eventHorizons.map((h) => h.trueEventKey), neighbour.key).toContain('V2');
    }
  });

  it('places every sample inside its unit, with true ages that keep stratigraphic order', () => {
    for (const site of allSites(scenario)) {
      let previous = -Infinity;
      let previousDepth = -Infinity;
      for (const sample of site.samples) {
        const unit = unitOf(site, sample.unitKey);
        expect(sample.depthM, sample.labCode).toBeGreaterThanOrEqual(unit.topDepthM);
        expect(sample.depthM, sample.labCode).toBeLessThanOrEqual(unit.baseDepthM);
        expect(sample.depthM).toBeGreaterThanOrEqual(previousDepth);
        previousDepth = sample.depthM;
        expect(Math.abs(sample.truth.depositCalBp - depositAgeAt(unit, sample.depthM))).toBeLessThanOrEqual(0.5);
        expect(sample.truth.depositCalBp).toBeGreaterThanOrEqual(unit.truth.topCalBp - 0.5);
        expect(sample.truth.depositCalBp).toBeLessThanOrEqual(unit.truth.baseCalBp + 0.5);
        if (sample.ageRelation === 'DATES_DEPOSIT') {
          expect(sample.truth.calBp, sample.labCode).toBe(sample.truth.depositCalBp);
          expect(sample.truth.calBp, `${site.key} ${sample.labCode} out of order`).toBeGreaterThanOrEqual(previous);
          previous = sample.truth.calBp;
          expect(sample.truth.calBp).toBeGreaterThanOrEqual(150);
        }
      }
    }
  });

  it('brackets every event horizon with dated samples below and above it', () => {
    for (const site of allSites(scenario)) {
      const horizons = site.eventHorizons;
      const events = [...scenario.trueEvents, ...scenario.secondProject.trueEvents];
      horizons.forEach((h, i) => {
        const below = unitOf(site, h.unitBelowKey).position;
        const above = unitOf(site, h.unitAboveKey).position;
        const floor = i + 1 < horizons.length ? unitOf(site, horizons[i + 1].unitAboveKey).position : 1;
        const ceiling = i > 0 ? unitOf(site, horizons[i - 1].unitBelowKey).position : site.units.length;
        const position = (key: string) => unitOf(site, key).position;
        const eventCalBp = events.find((e) => e.key === h.trueEventKey)?.calBp ?? NaN;
        const dating = site.samples.filter((x) => x.ageRelation === 'DATES_DEPOSIT');
        const older = dating.filter((x) => position(x.unitKey) >= floor && position(x.unitKey) <= below);
        const younger = dating.filter((x) => position(x.unitKey) >= above && position(x.unitKey) <= ceiling);
        expect(older.length, `${site.key} ${h.name} below`).toBeGreaterThan(0);
        expect(younger.length, `${site.key} ${h.name} above`).toBeGreaterThan(0);
        for (const x of older) expect(x.truth.calBp).toBeGreaterThanOrEqual(eventCalBp);
        for (const x of younger) expect(x.truth.calBp).toBeLessThanOrEqual(eventCalBp);
        // The sample just below dates the pre-event surface closely (slow trench soils less so); in a
        // core that surface is the top of the mud the bed's base left, older than the event by the scour.
        const surfaceCalBp = site.kind === 'CORE' ? unitOf(site, h.unitBelowKey).truth.topCalBp : eventCalBp;
        const gap = Math.min(...older.map((x) => x.truth.calBp)) - surfaceCalBp;
        expect(gap, `${site.key} ${h.name}`).toBeLessThan(site.kind === 'TRENCH' ? 250 : 100);
      });
    }
  });

  it('indexes the real curves as published', () => {
    // Spot values of the shipped curves (reference-data/SOURCES.md, from Reimer et al. 2020 and Heaton et al. 2020) [published].
    expect(curves.intcal20.mu[1000 - curves.intcal20.startCalBp]).toBeCloseTo(1126, 0);
    expect(curves.marine20.mu[1000 - curves.marine20.startCalBp]).toBeCloseTo(1620.53, 1);
  });

  it('gives each 14C age the scatter the calibration model expects of its true age', () => {
    // z = (c14 - mu(t) - DeltaR) / sqrt(s^2 + sigma(t)^2 + sigma_DeltaR^2): standard normal under the calibration
    // likelihood of the product brief (Stuiver & Polach 1977; Reimer et al. 2020) [analytic].
    const zs: number[] = [];
    for (const site of allSites(scenario)) {
      for (const x of site.samples.filter((s) => s.method === 'RADIOCARBON')) {
        expect(x.c14Age, x.labCode).not.toBeNull();
        expect(x.c14Error).toBeGreaterThanOrEqual(18);
        expect(x.c14Error).toBeLessThanOrEqual(60);
        const marine = x.material === 'PLANKTIC_FORAMS';
        expect(x.curve).toBe(marine ? 'MARINE20' : 'INTCAL20');
        const curve = marine ? curves.marine20 : curves.intcal20;
        const i = x.truth.calBp - curve.startCalBp;
        const deltaR = marine ? 150 : 0;
        const deltaRError = marine ? 40 : 0;
        expect(x.deltaR).toBe(marine ? 150 : null);
        expect(x.deltaRError).toBe(marine ? 40 : null);
        const z =
          ((x.c14Age as number) - curve.mu[i] - deltaR) /
          Math.sqrt((x.c14Error as number) ** 2 + curve.sigma[i] ** 2 + deltaRError ** 2);
        expect(Math.abs(z), `${x.labCode} z = ${z.toFixed(2)}`).toBeLessThan(4);
        // Laboratories' rounding: whole years (marine laboratory) or 5 years (land laboratory).
        if (!marine) expect((x.c14Age as number) % 5).toBe(0);
        expect(Number.isInteger(x.c14Age)).toBe(true);
        zs.push(z);
      }
    }
    // Mean z^2 near 1 (its SD is about sqrt(2/n) = 0.15 for n near 90) [analytic].
    const meanSquare = zs.reduce((s, z) => s + z * z, 0) / zs.length;
    expect(meanSquare).toBeGreaterThan(0.55);
    expect(meanSquare).toBeLessThan(1.6);
    for (const site of scenario.sites) expect(Math.abs(site.latitude)).toBeLessThan(60); // Marine20 is non-polar
  });

  it('reports luminescence ages in years before their measurement year', () => {
    const osl = scenario.sites.flatMap((s) => s.samples.filter((x) => x.method === 'LUMINESCENCE'));
    expect(osl.length).toBeGreaterThanOrEqual(1);
    expect(osl.length).toBeLessThanOrEqual(2);
    for (const x of osl) {
      expect(x.measurementYear).toBeGreaterThan(2000);
      expect(x.c14Age).toBeNull();
      expect(x.ageRelation).toBe('DATES_DEPOSIT');
      // cal BP = age - (measurement year - 1950): 1075 +- 70 a measured in 2019 is 945 CE (CHECKS.md, a published OSL table).
      const calBp = (x.calendarAgeBp as number) - ((x.measurementYear as number) - 1950);
      expect(Math.abs(calBp - x.truth.calBp) / (x.calendarErrorYears as number)).toBeLessThan(4);
    }
    // The offset of 69-72 years is only 1.5 sigma per sample, so look at many seeds: the mean standardised residual is
    // 0 +- 0.13 (60 samples) when ages count from the measurement year, near -1.5 to -2 had they counted from 1950 [analytic].
    const residuals: number[] = [];
    for (let seed = 1; seed <= 30; seed++) {
      for (const site of generateDemoScenario(seed, curves).sites) {
        for (const x of site.samples.filter((s) => s.method === 'LUMINESCENCE')) {
          const calBp = (x.calendarAgeBp as number) - ((x.measurementYear as number) - 1950);
          residuals.push((calBp - x.truth.calBp) / (x.calendarErrorYears as number));
        }
      }
    }
    expect(Math.abs(jStat.mean(residuals))).toBeLessThan(0.6);
    // The worked example itself: 2019 - 1075 = 944 CE, the table's 945 CE within its rounding of a year.
    expect(Math.abs(1950 - (1075 - (2019 - 1950)) - 945)).toBeLessThanOrEqual(1);
  });

  it('includes the complications real records have', () => {
    const samples = scenario.sites.flatMap((s) => s.samples);
    const inherited = samples.filter((x) => x.material === 'DETRITAL_CHARCOAL' && x.ageRelation === 'OLDER_THAN_DEPOSIT');
    const modest = inherited.filter((x) => !x.truth.outlier);
    const outliers = inherited.filter((x) => x.truth.outlier);
    expect(modest.length).toBeGreaterThanOrEqual(1);
    for (const x of modest) {
      expect(x.truth.inheritanceYears).toBeGreaterThan(0);
      expect(x.truth.inheritanceYears).toBeLessThan(800);
    }
    expect(outliers).toHaveLength(1);
    expect(outliers[0].truth.inheritanceYears).toBeGreaterThan(1000);

    const roots = samples.filter((x) => x.ageRelation === 'YOUNGER_THAN_DEPOSIT');
    expect(roots).toHaveLength(1);
    expect(roots[0].notes).toMatch(/root/i);
    expect(roots[0].truth.intrusionYears).toBeGreaterThan(300);

    for (const site of scenario.sites.filter((s) => s.kind === 'CORE')) {
      const facies = site.units.map((u) => u.facies);
      // Mud, bed, mud, bed, ..., mud from the base up.
      facies.forEach((f, i) => expect(f).toBe(i % 2 === 0 ? 'HEMIPELAGIC_MUD' : 'TURBIDITE'));
      // Mud thickness is time times the sedimentation rate, to within the millimetre of logging.
      const rateMPerYr = site.truth.accumulationMmPerYr / 1000;
      for (const u of site.units.filter((x) => x.facies === 'HEMIPELAGIC_MUD' && x.truth.baseCalBp - x.truth.topCalBp > 100)) {
        const expected = (u.truth.baseCalBp - u.truth.topCalBp) * rateMPerYr;
        expect(Math.abs(u.baseDepthM - u.topDepthM - expected), `${site.key} ${u.key}`).toBeLessThanOrEqual(0.0011);
      }
      for (const u of site.units.filter((x) => x.facies === 'TURBIDITE')) expect(u.truth.topCalBp).toBe(u.truth.baseCalBp);
    }
  });

  it('records each core turbidite\'s true basal erosion, logged with error or missed when thin, and no erosion elsewhere', () => {
    const units = scenario.sites.flatMap((site) => site.units.map((unit) => ({ site, unit })));
    const eroding = units.filter(({ unit }) => unit.truth.erodedM > 0);
    expect(eroding.length).toBeGreaterThan(3);
    for (const { site, unit } of eroding) {
      expect(site.kind).toBe('CORE');
      expect(unit.facies).toBe('TURBIDITE');
      expect(unit.truth.erodedM).toBeGreaterThanOrEqual(0.003);
      expect(unit.truth.erodedM).toBeLessThanOrEqual(0.03);
      if (unit.truth.erodedM < 0.005) expect(unit.basalErosionM).toBeNull();
      // A lognormal logging error of sd 0.35: within a factor of 3 (over 3 sd) of the truth.
      if (unit.basalErosionM !== null) expect(Math.abs(Math.log(unit.basalErosionM / unit.truth.erodedM))).toBeLessThan(Math.log(3));
    }
    for (const { unit } of units.filter(({ unit }) => unit.truth.erodedM === 0)) expect(unit.basalErosionM).toBeNull();
    // The mud under an eroding bed lost its top: its top age is older than the event the bed records.
    for (const site of scenario.sites.filter((s) => s.kind === 'CORE')) {
      const byPosition = [...site.units].sort((a, b) => a.position - b.position);
      byPosition.forEach((unit, i) => {
        if (unit.truth.erodedM > 0) expect(byPosition[i - 1].truth.topCalBp).toBeGreaterThan(unit.truth.baseCalBp);
      });
    }
  });

  it('uses unique, invented laboratory codes', () => {
    const codes = allSites(scenario).flatMap((s) => s.samples.map((x) => x.labCode));
    expect(new Set(codes).size).toBe(codes.length);
    // Published laboratory prefixes to stay clear of (a partial list) [memory].
    const real = [
      'Beta', 'OxA', 'UCIAMS', 'AA', 'SUERC', 'Poz', 'KIA', 'CAMS', 'GrA', 'GrN', 'Wk', 'NZA', 'ETH',
      'ISGS', 'LLNL', 'TO', 'IAAA', 'PLD', 'LuS', 'Ua', 'Hela', 'BA', 'OZ', 'ANU', 'D-AMS',
    ];
    for (const code of codes) {
      expect(code).toMatch(/^(VKR-\d{5}|TSH-\d{4}|OLX\d{2}-\d{3})$/);
      const prefix = code.split(/[-\d]/)[0];
      expect(real.map((r) => r.toUpperCase())).not.toContain(prefix.toUpperCase());
    }
  });

  it('places sites on valid coordinates that match their along-strike position', () => {
    for (const site of scenario.sites) {
      expect(site.latitude).toBeGreaterThan(-90);
      expect(site.latitude).toBeLessThan(60);
      expect(site.longitude).toBeGreaterThanOrEqual(-180);
      expect(site.longitude).toBeLessThanOrEqual(180);
      const segment = scenario.segments.find((s) => s.key === site.segmentKey);
      expect(site.alongStrikeKm).toBeGreaterThanOrEqual(segment?.startKm ?? NaN);
      expect(site.alongStrikeKm).toBeLessThanOrEqual(segment?.endKm ?? NaN);
      expect(site.kind === 'CORE' ? site.waterDepthM : site.elevationM).toBeGreaterThan(0);
      expect(site.kind === 'CORE' ? site.elevationM : site.waterDepthM).toBeNull();
      // Over a few hundred km the margin's frame is nearly flat: distance from the origin ~ sqrt(along^2 + across^2).
      const d = haversineKm(VELMORA_GEOMETRY.originLatitude, VELMORA_GEOMETRY.originLongitude, site.latitude, site.longitude);
      const flat = Math.hypot(site.alongStrikeKm, site.truth.acrossStrikeKm);
      expect(Math.abs(d - flat), site.key).toBeLessThan(0.015 * flat + 0.5);
    }
  });

  it('ties the preferred hypothesis by true event, site to neighbouring site along strike', () => {
    const preferred = scenario.hypotheses.filter((h) => h.preferred);
    expect(preferred).toHaveLength(1);
    const horizon = (ref: { siteKey: string; horizonKey: string }) => {
      const site = scenario.sites.find((s) => s.key === ref.siteKey);
      const h = site?.eventHorizons.find((x) => x.key === ref.horizonKey);
      if (!site || !h) throw new Error(`no horizon ${ref.siteKey}/${ref.horizonKey}`);
      return { site, h };
    };
    for (const tie of preferred[0].ties) {
      const a = horizon(tie.eventAKey);
      const b = horizon(tie.eventBKey);
      expect(a.h.trueEventKey).toBe(b.h.trueEventKey);
      expect([1, 2, 3, 4]).toContain(tie.confidence);
      expect(tie.evidence.length).toBeGreaterThan(0);
      // No site recording the same event lies between the two tied sites.
      const between = scenario.sites.filter(
        (s) =>
          s.alongStrikeKm > Math.min(a.site.alongStrikeKm, b.site.alongStrikeKm) &&
          s.alongStrikeKm < Math.max(a.site.alongStrikeKm, b.site.alongStrikeKm) &&
          s.eventHorizons.some((x) => x.trueEventKey === a.h.trueEventKey),
      );
      expect(between).toEqual([]);
    }
    // A chain per event: n sites recording it, n - 1 ties.
    for (const event of scenario.trueEvents) {
      const recording = scenario.sites.filter((s) => s.eventHorizons.some((h) => h.trueEventKey === event.key)).length;
      const ties = preferred[0].ties.filter((t) => horizon(t.eventAKey).h.trueEventKey === event.key).length;
      expect(ties, event.key).toBe(Math.max(0, recording - 1));
    }
  });

  it('offers a competing hypothesis that differs in the south and keeps ties from crossing', () => {
    const alternative = scenario.hypotheses.find((h) => !h.preferred);
    const preferred = scenario.hypotheses.find((h) => h.preferred);
    if (!alternative || !preferred) throw new Error('expected two hypotheses');
    const key = (t: (typeof alternative.ties)[number]) => JSON.stringify([t.eventAKey, t.eventBKey]);
    const onlyAlternative = alternative.ties.filter((t) => !preferred.ties.some((p) => key(p) === key(t)));
    const onlyPreferred = preferred.ties.filter((t) => !alternative.ties.some((p) => key(p) === key(t)));
    expect(onlyAlternative.length + onlyPreferred.length).toBeGreaterThan(0);
    const siteOf = (k: string) => scenario.sites.find((s) => s.key === k) as DemoSite;
    for (const t of [...onlyAlternative, ...onlyPreferred]) {
      expect([siteOf(t.eventAKey.siteKey).segmentKey, siteOf(t.eventBKey.siteKey).segmentKey]).toContain('SOUTH');
    }

    // Order check: between any two sites, tied horizons keep the same up-down order at both.
    for (const hypothesis of scenario.hypotheses) {
      const rank = (siteKey: string, horizonKey: string) =>
        siteOf(siteKey).eventHorizons.findIndex((h) => h.key === horizonKey);
      for (const t1 of hypothesis.ties) {
        for (const t2 of hypothesis.ties) {
          if (t1.eventAKey.siteKey !== t2.eventAKey.siteKey || t1.eventBKey.siteKey !== t2.eventBKey.siteKey) continue;
          const a = rank(t1.eventAKey.siteKey, t1.eventAKey.horizonKey) - rank(t2.eventAKey.siteKey, t2.eventAKey.horizonKey);
          const b = rank(t1.eventBKey.siteKey, t1.eventBKey.horizonKey) - rank(t2.eventBKey.siteKey, t2.eventBKey.horizonKey);
          expect(Math.sign(a), `${hypothesis.name}: crossing ties`).toBe(Math.sign(b));
        }
      }
    }
  });

  it('describes a second, crustal project of which only the admin is a member', () => {
    const second = scenario.secondProject;
    expect(second.project.tectonicSetting).toBe('CRUSTAL');
    expect(second.project.name).not.toBe(scenario.project.name);
    expect(second.members).toEqual([{ email: 'admin@demo.test', role: 'ADMIN' }]);
    expect(second.segments).toHaveLength(1);
    expect(second.sites.length).toBeGreaterThanOrEqual(1);
    expect(second.sites.length).toBeLessThanOrEqual(2);
    for (const site of second.sites) {
      expect(site.segmentKey).toBe(second.segments[0].key);
      expect(site.eventHorizons.length).toBeGreaterThanOrEqual(2);
      expect(site.samples.length).toBeGreaterThan(site.eventHorizons.length);
    }
    const names = new Set(scenario.sites.map((s) => s.name));
    for (const site of second.sites) expect(names.has(site.name)).toBe(false);
  });
});
