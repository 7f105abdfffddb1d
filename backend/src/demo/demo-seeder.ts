import { Injectable } from '@nestjs/common';
import { hashPassword } from '../auth/passwords';
import { CalibrationService } from '../calibration/calibration.service';
import { DatabaseService, Executor } from '../database/database.service';
import * as schema from '../database/schema';
import { builtInCurve } from '../reference-data/reference-data';
import { sampleMeasurements } from '../samples/sample-rules';
import { DEMO_SEED, generateDemoScenario } from './generate';

/** Password of every demo account (README). */
export const DEMO_PASSWORD = 'stratochron-demo';

type GeneratedScenario = ReturnType<typeof generateDemoScenario>;
type GeneratedProject = GeneratedScenario['secondProject'] | GeneratedScenario;

/**
 * Writes the invented demo scenario (backend/src/demo/README.md) into an empty database in one
 * transaction: the demo accounts, the Velmora Margin project with its column data and correlation
 * hypotheses, and a second project of which only the admin is a member.
 */
@Injectable()
export class DemoSeeder {
  constructor(
    private readonly database: DatabaseService,
    private readonly calibration: CalibrationService,
  ) {}

  /** Seed and return a one-line summary. Also returns the demo project's id for queuing runs. */
  async seed(): Promise<{ summary: string; projectId: string; siteIds: string[] }> {
    const scenario = generateDemoScenario(DEMO_SEED, { intcal20: builtInCurve('INTCAL20'), marine20: builtInCurve('MARINE20') });
    const calibrate = await this.calibration.sampleCalibrator();
    const passwordHash = await hashPassword(DEMO_PASSWORD);
    return this.database.transaction(async (tx) => {
      const userIds = new Map<string, string>();
      for (const person of scenario.people) {
        const [user] = await tx
          .insert(schema.users)
          .values({ email: person.email, displayName: person.name, passwordHash })
          .returning({ id: schema.users.id });
        userIds.set(person.email, user.id);
      }
      const main = await this.writeProject(tx, scenario, calibrate);
      for (const person of scenario.people) {
        await tx.insert(schema.memberships).values({ projectId: main.projectId, userId: userIds.get(person.email)!, role: person.role });
      }
      const second = await this.writeProject(tx, scenario.secondProject, calibrate);
      const admin = scenario.people.find((p) => p.role === 'ADMIN')!;
      await tx.insert(schema.memberships).values({ projectId: second.projectId, userId: userIds.get(admin.email)!, role: 'ADMIN' });
      const summary = `${scenario.people.length} accounts, project "${scenario.project.name}" with ${main.siteIds.length} sites and ${main.sampleCount} samples, and "${scenario.secondProject.project.name}"`;
      return { summary, projectId: main.projectId, siteIds: main.siteIds };
    });
  }

  private async writeProject(
    tx: Executor,
    scenario: GeneratedProject,
    calibrate: Awaited<ReturnType<CalibrationService['sampleCalibrator']>>,
  ): Promise<{ projectId: string; siteIds: string[]; sampleCount: number }> {
    const [project] = await tx
      .insert(schema.projects)
      .values({ name: scenario.project.name, description: scenario.project.description, tectonicSetting: scenario.project.tectonicSetting })
      .returning({ id: schema.projects.id });
    const segmentIds = new Map<string, string>();
    for (const segment of scenario.segments) {
      const [row] = await tx
        .insert(schema.segments)
        .values({ projectId: project.id, name: segment.name, startKm: segment.startKm, endKm: segment.endKm })
        .returning({ id: schema.segments.id });
      segmentIds.set(segment.key, row.id);
    }
    const horizonIds = new Map<string, string>();
    const siteIds: string[] = [];
    let sampleCount = 0;
    for (const site of scenario.sites) {
      const [siteRow] = await tx
        .insert(schema.sites)
        .values({
          projectId: project.id,
          segmentId: segmentIds.get(site.segmentKey) ?? null,
          name: site.name,
          kind: site.kind,
          latitude: site.latitude,
          longitude: site.longitude,
          alongStrikeKm: site.alongStrikeKm,
          elevationM: site.elevationM ?? null,
          waterDepthM: site.waterDepthM ?? null,
          notes: site.notes ?? null,
        })
        .returning({ id: schema.sites.id });
      siteIds.push(siteRow.id);
      const unitIds = new Map<string, string>();
      for (const unit of site.units) {
        const [row] = await tx
          .insert(schema.units)
          .values({ siteId: siteRow.id, position: unit.position, name: unit.name, topDepthM: unit.topDepthM, baseDepthM: unit.baseDepthM, facies: unit.facies, basalErosionM: unit.basalErosionM, notes: unit.notes ?? null })
          .returning({ id: schema.units.id });
        unitIds.set(unit.key, row.id);
      }
      for (const horizon of site.eventHorizons) {
        const [row] = await tx
          .insert(schema.eventHorizons)
          .values({
            siteId: siteRow.id,
            name: horizon.name,
            unitBelowId: unitIds.get(horizon.unitBelowKey)!,
            unitAboveId: unitIds.get(horizon.unitAboveKey)!,
            quality: horizon.quality,
            evidence: [...horizon.evidence],
          })
          .returning({ id: schema.eventHorizons.id });
        horizonIds.set(`${site.key}/${horizon.key}`, row.id);
      }
      for (const sample of site.samples) {
        const dating = { ...sample, latitude: site.latitude };
        const calibration = calibrate(dating);
        if ('field' in calibration) throw new Error(`demo sample ${sample.labCode} cannot be calibrated: ${calibration.message}`);
        await tx.insert(schema.samples).values({
          projectId: project.id,
          siteId: siteRow.id,
          unitId: unitIds.get(sample.unitKey)!,
          ...sampleMeasurements(sample),
          calibration,
        });
        sampleCount++;
      }
    }
    for (const hypothesis of scenario.hypotheses) {
      const [row] = await tx
        .insert(schema.hypotheses)
        .values({ projectId: project.id, name: hypothesis.name, description: hypothesis.description, preferred: hypothesis.preferred })
        .returning({ id: schema.hypotheses.id });
      for (const tie of hypothesis.ties) {
        await tx.insert(schema.ties).values({
          hypothesisId: row.id,
          eventAId: horizonIds.get(`${tie.eventAKey.siteKey}/${tie.eventAKey.horizonKey}`)!,
          eventBId: horizonIds.get(`${tie.eventBKey.siteKey}/${tie.eventBKey.horizonKey}`)!,
          confidence: tie.confidence,
          evidence: [...tie.evidence],
        });
      }
    }
    return { projectId: project.id, siteIds, sampleCount };
  }
}
