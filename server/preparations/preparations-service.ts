import { randomInt } from 'node:crypto';
import { findPreparation, findVersion } from './find-version';
import type { EquipmentItem } from '../../shared/contracts/library';
import type {
  Override,
  PlanProblem,
  ReadingsRequest,
  RecordedReadings,
  PreparationDetail,
  PreparationSummary,
  PreparationWrite,
  VersionDetail,
  VersionSummary,
} from '../../shared/contracts/preparations';
import { isStepKind, STEP_KINDS } from '../../shared/contracts/step-kinds';
import { parsePlan, PlanError, resultStatement } from '../../shared/uncertainty';
import type { AuditRepository } from '../audit/audit-repository';
import type { LabActor } from '../auth/authorize';
import { allowedActions, allows, ownsPreparation, type LabMember } from '../../shared/domain/version-lifecycle';
import { sha256Hex } from '../lib/canonical-json';
import { AppError, conflict, forbidden, notFound, validationError } from '../lib/errors';
import type { LibraryService } from '../library/library-service';
import type { PolicyService } from '../policy/policy-service';
import type { Computer } from '../compute/compute-pool';
import { resolvePlan } from './plan-resolver';
import { readStoredSnapshot, storedSnapshotJson } from './stored-snapshot';
import {
  type PreparationRow,
  type PreparationsRepository,
  type ReviewRow,
  type VersionRow,
  type VersionWrite,
} from './preparations-repository';
import type { Review } from '../../shared/contracts/reviews';
import { approvedAsOf } from '../reviews/approved-record';
import { versionFacts } from './version-facts';
import type { Transact } from '../db/transaction';

const parse = <T>(json: string | null): T | null => (json === null ? null : (JSON.parse(json) as T));

/** The code of the library material a plan's steps name, before any computation (null when none is chosen yet). */
function plannedMaterialCode(plan: Record<string, unknown>, library: Map<string, EquipmentItem>): string | null {
  const steps = Array.isArray(plan.steps) ? (plan.steps as unknown[]) : [];
  for (const step of steps) {
    const material = typeof step === 'object' && step !== null ? (step as { material?: unknown }).material : undefined;
    const libraryId =
      typeof material === 'object' && material !== null ? (material as { libraryId?: unknown }).libraryId : undefined;
    const item = typeof libraryId === 'string' ? library.get(libraryId) : undefined;
    if (item?.kind.endsWith('-material')) return item.code;
  }
  return null;
}

function toSummary(row: VersionRow): VersionSummary {
  return {
    id: row.id,
    number: row.number,
    status: row.status,
    createdBy: row.created_by_name,
    createdAt: row.created_at,
    updatedAt: row.updated_at,
    resultStatement: row.result_statement,
    editable: allows('edit', row.status),
  };
}

const toReview = (row: ReviewRow): Review => ({
  id: row.id,
  action: row.action,
  actor: row.actor_name,
  at: row.at,
  comment: row.comment,
  snapshotSha256: row.snapshot_sha256,
  recordSha256: row.record_sha256 ?? null,
});

/** A version as `member` reads it: with what they may do with it now. */
function toVersionDetail(
  row: VersionRow,
  reviews: ReviewRow[],
  preparation: { ownerId: number; latestNumber: number },
  member: LabMember,
): VersionDetail {
  return {
    ...toSummary(row),
    reviews: reviews.map(toReview),
    readings: parse<RecordedReadings>(row.readings_json),
    plan: JSON.parse(row.plan_json),
    overrides: JSON.parse(row.overrides_json),
    seed: Number(row.seed),
    problem: parse<PlanProblem>(row.problem_json),
    snapshot: row.snapshot_json === null ? null : readStoredSnapshot(row.snapshot_json),
    snapshotSha256: row.snapshot_sha256,
    approvedAs: approvedAsOf(row),
    recordSha256: row.record_sha256 ?? null,
    allowedActions: allowedActions(member, versionFacts(row, reviews, preparation)),
  };
}

function preparationSummary(prep: PreparationRow, latest: VersionRow): PreparationSummary {
  return {
    id: prep.id,
    title: prep.title,
    analyte: prep.analyte,
    materialCode: prep.material_code,
    createdBy: prep.created_by_name,
    createdById: prep.created_by,
    createdAt: prep.created_at,
    updatedAt: prep.updated_at,
    latestVersion: toSummary(latest),
    value: latest.value,
    unit: latest.unit,
    relativeExpandedUncertainty: latest.relative_expanded_uncertainty,
  };
}

/** Why no new version can start while the latest one is still on its way. */
function noNewVersionFrom(latest: VersionRow): AppError {
  if (allows('edit', latest.status))
    return conflict('draft_exists', `Version ${latest.number} can still be edited: change that one.`);
  if (latest.status === 'submitted')
    return conflict(
      'under_review',
      `Version ${latest.number} is waiting for review; a new version can start once it is approved or returned.`,
    );
  return conflict(
    'draft_exists',
    `Version ${latest.number} has been prepared: correct its readings or submit it for review.`,
  );
}

const analyteOf = (plan: Record<string, unknown>) =>
  String((plan.analyte as { formula?: unknown } | undefined)?.formula ?? '').slice(0, 40);

export function preparationsService(deps: {
  transact: Transact;
  preparations: PreparationsRepository;
  items: LibraryService;
  policy: PolicyService;
  audit: AuditRepository;
  computer: Computer;
  now: () => Date;
}) {
  const { transact, preparations, items, policy, audit, computer, now } = deps;

  async function libraryOf(labId: number): Promise<Map<string, EquipmentItem>> {
    return new Map((await items.list(labId, { status: 'all' })).map((item) => [String(item.id), item]));
  }

  /**
   * A plan must at least have the plan document's shape (types, units, required fields); one that
   * does not is refused without writing anything. A well-formed plan the engine cannot compute
   * (an aliquot larger than its flask, an overdue item without a reason) is kept as a draft with
   * its problem, so the analyst's work is never lost.
   */
  function assertWellFormed(plan: Record<string, unknown>) {
    try {
      parsePlan(plan);
    } catch (error) {
      if (!(error instanceof PlanError)) throw error;
      throw new AppError('validation', 'plan_invalid', error.message, [
        { path: ['plan', ...error.path].join('.'), message: error.message },
      ]);
    }
  }

  /** Resolves against the library and computes; a plan the engine refuses is kept with its problem. */
  async function compute(
    labId: number,
    plan: Record<string, unknown>,
    overrides: Override[],
    seed: number,
    signal?: AbortSignal,
  ): Promise<VersionWrite & { materialCode: string | null }> {
    assertWellFormed(plan);
    const at = now().toISOString();
    const library = await libraryOf(labId);
    const base = { plan_json: JSON.stringify(plan), overrides_json: JSON.stringify(overrides), seed, updated_at: at };
    try {
      const resolved = resolvePlan(plan, library, overrides);
      const snapshot = await computer.snapshot(
        labId,
        { plan: resolved.plan, items: resolved.items, seed, computedAt: at, policy: await policy.read(labId) },
        signal,
      );
      const { budget } = snapshot;
      const snapshotJson = storedSnapshotJson(snapshot);
      const material = resolved.items.find((i) => i.kind.endsWith('-material'));
      return {
        ...base,
        problem_json: null,
        snapshot_json: snapshotJson,
        snapshot_sha256: sha256Hex(snapshotJson),
        result_statement: resultStatement(snapshot).text,
        value: budget.value,
        unit: budget.unit,
        relative_expanded_uncertainty: budget.relativeExpandedUncertainty,
        materialCode: material?.code ?? null,
      };
    } catch (error) {
      if (!(error instanceof PlanError)) throw error;
      return {
        ...base,
        problem_json: JSON.stringify({ path: error.path, message: error.message }),
        snapshot_json: null,
        snapshot_sha256: null,
        result_statement: null,
        value: null,
        unit: null,
        relative_expanded_uncertainty: null,
        // The list still names the material the analyst chose, though the plan cannot be computed yet.
        materialCode: plannedMaterialCode(plan, library),
      };
    }
  }

  async function versionRow(labId: number, id: number, number: number): Promise<VersionRow> {
    return (await findVersion(preparations, labId, id, number)).version;
  }

  async function detail(labId: number, id: number, member: LabMember): Promise<PreparationDetail> {
    const prep = await findPreparation(preparations, labId, id);
    const versions = await preparations.versionsOf(id);
    const [latest] = versions;
    return {
      ...preparationSummary(prep, latest),
      versions: versions.map(toSummary),
      current: toVersionDetail(
        latest,
        await preparations.reviewsOf(latest.id),
        { ownerId: prep.created_by, latestNumber: latest.number },
        member,
      ),
    };
  }

  return {
    detail,

    /** Computes a plan against the lab's library without saving anything (for integrations and load tests). */
    async computeOnly(
      labId: number,
      input: { plan: Record<string, unknown>; overrides: Override[]; seed: number; trials?: number },
      signal?: AbortSignal,
    ) {
      assertWellFormed(input.plan);
      const resolved = resolvePlan(input.plan, await libraryOf(labId), input.overrides);
      const job = {
        plan: resolved.plan,
        items: resolved.items,
        seed: input.seed,
        computedAt: now().toISOString(),
        policy: await policy.read(labId),
        trials: input.trials,
      };
      return computer.snapshot(labId, job, signal);
    },

    async list(labId: number, filter: Parameters<PreparationsRepository['list']>[1]): Promise<PreparationSummary[]> {
      const rows = await preparations.list(labId, filter);
      const latest = new Map(
        (await preparations.versionsByIds(rows.map((r) => r.latest_version_id))).map((v) => [v.id, v]),
      );
      return rows.map((row) => preparationSummary(row, latest.get(row.latest_version_id) as VersionRow));
    },

    async version(labId: number, id: number, number: number, member: LabMember): Promise<VersionDetail> {
      const prep = await findPreparation(preparations, labId, id);
      const [latest] = await preparations.versionsOf(id);
      const row = await preparations.version(id, number);
      if (!row) throw notFound(`Version ${number}`);
      return toVersionDetail(
        row,
        await preparations.reviewsOf(row.id),
        { ownerId: prep.created_by, latestNumber: latest.number },
        member,
      );
    },

    /**
     * The snapshot download: the snapshot as stored, not decoded, so that its canonical JSON is the very text its
     * SHA-256 covers (older snapshots keep their null for ∞), with the hashes, frozen fields and reviews.
     */
    async snapshotDownload(labId: number, id: number, number: number) {
      const row = await versionRow(labId, id, number);
      const snapshot: unknown = row.snapshot_json === null ? null : JSON.parse(row.snapshot_json);
      return {
        snapshot,
        snapshotSha256: row.snapshot_sha256,
        approvedAs: approvedAsOf(row),
        recordSha256: row.record_sha256 ?? null,
        reviews: (await preparations.reviewsOf(row.id)).map(toReview),
      };
    },

    async create(
      labId: number,
      actor: LabActor,
      input: PreparationWrite & { overrides: Override[] },
      signal?: AbortSignal,
    ): Promise<PreparationDetail> {
      const seed = input.seed ?? randomInt(0, 2 ** 32);
      const computed = await compute(labId, input.plan, input.overrides, seed, signal);
      const { materialCode, ...write } = computed;
      const at = now().toISOString();
      const id = await transact(async (trx) => {
        const preparationId = await preparations.insertPreparation(
          { labId, title: input.title, analyte: analyteOf(input.plan), materialCode, createdBy: actor.id, at },
          trx,
        );
        await preparations.insertVersion(preparationId, 1, { ...write, created_by: actor.id, created_at: at }, trx);
        await audit.record(
          {
            labId,
            actorUserId: actor.id,
            action: 'preparation.created',
            entityType: 'preparation',
            entityId: preparationId,
            summary: `${actor.name} created “${input.title}”`,
            after: { statement: write.result_statement },
          },
          trx,
        );
        return preparationId;
      });
      return detail(labId, id, actor);
    },

    /** Saves (and recomputes) the draft version; only its author may, and only while it is a draft. */
    async saveDraft(
      labId: number,
      actor: LabActor,
      id: number,
      number: number,
      input: PreparationWrite & { overrides: Override[] },
      signal?: AbortSignal,
    ): Promise<PreparationDetail> {
      const { prep, version: current } = await findVersion(preparations, labId, id, number);
      if (!allows('edit', current.status))
        throw conflict('not_draft', `Version ${number} is ${current.status}; changes go into a new version.`);
      if (!ownsPreparation(actor, { ownerId: prep.created_by }))
        throw forbidden(
          'Only the analyst who owns this preparation can change its draft. Duplicate it to make your own variant.',
        );
      const computed = await compute(labId, input.plan, input.overrides, input.seed ?? Number(current.seed), signal);
      const { materialCode, ...write } = computed;
      await transact(async (trx) => {
        const changed = await preparations.updateDraft(current.id, write, trx);
        if (changed === 0) throw conflict('not_draft', `Version ${number} is no longer a draft.`);
        await preparations.touchPreparation(
          id,
          { title: input.title, analyte: analyteOf(input.plan), materialCode, at: write.updated_at },
          trx,
        );
        await audit.record(
          {
            labId,
            actorUserId: actor.id,
            action: 'preparation.computed',
            entityType: 'preparation',
            entityId: id,
            summary: `${actor.name} saved version ${number} of “${input.title}”${write.result_statement ? `: ${write.result_statement}` : ' (not computable yet)'}`,
            before: { statement: current.result_statement },
            after: { statement: write.result_statement },
          },
          trx,
        );
      });
      return detail(labId, id, actor);
    },

    /** Starts a new draft version from the latest one, once it is approved (a returned one is edited instead). */
    async newVersion(labId: number, actor: LabActor, id: number, signal?: AbortSignal): Promise<PreparationDetail> {
      const prep = await findPreparation(preparations, labId, id);
      const [latest] = await preparations.versionsOf(id);
      if (!allows('startNewVersion', latest.status)) throw noNewVersionFrom(latest);
      const computed = await compute(
        labId,
        JSON.parse(latest.plan_json),
        JSON.parse(latest.overrides_json),
        Number(latest.seed),
        signal,
      );
      const { materialCode: _material, ...write } = computed;
      await transact(async (trx) => {
        await preparations.insertVersion(
          id,
          latest.number + 1,
          { ...write, created_by: actor.id, created_at: write.updated_at },
          trx,
        );
        await preparations.touchPreparation(
          id,
          { title: prep.title, analyte: prep.analyte, materialCode: prep.material_code, at: write.updated_at },
          trx,
        );
        await audit.record(
          {
            labId,
            actorUserId: actor.id,
            action: 'preparation.versioned',
            entityType: 'preparation',
            entityId: id,
            summary: `${actor.name} started version ${latest.number + 1} of “${prep.title}”`,
          },
          trx,
        );
      });
      return detail(labId, id, actor);
    },

    /**
     * Records the masses actually weighed at the bench (and any deviation): the plan's planned
     * masses are replaced by them, the budget is recomputed on the actual values, and the version
     * becomes "prepared". Readings can be corrected until the version is submitted.
     */
    async recordReadings(
      labId: number,
      actor: LabActor,
      id: number,
      number: number,
      input: ReadingsRequest & { deviations: string },
      signal?: AbortSignal,
    ): Promise<PreparationDetail> {
      const { prep, version: current } = await findVersion(preparations, labId, id, number);
      if (!ownsPreparation(actor, { ownerId: prep.created_by }))
        throw forbidden('Only the analyst who owns this preparation records its readings.');
      if (!allows('recordReadings', current.status))
        throw conflict('not_draft', `Version ${number} is ${current.status}; its readings can no longer change.`);
      const previous = parse<RecordedReadings>(current.readings_json);
      const plan = JSON.parse(current.plan_json) as { steps?: Record<string, unknown>[] };
      const steps = plan.steps ?? [];
      const recorded: RecordedReadings['readings'] = [];
      const issues: { path: string; message: string }[] = [];
      input.readings.forEach((reading, index) => {
        const step = steps[reading.stepIndex];
        const field = step && isStepKind(step.kind) ? STEP_KINDS[step.kind].recordedMass : null;
        if (!step || !field) {
          issues.push({
            path: `readings.${index}.stepIndex`,
            message: `Step ${reading.stepIndex + 1} is not a weighing step.`,
          });
          return;
        }
        if (
          reading.tareG !== undefined &&
          reading.grossG !== undefined &&
          Math.abs(reading.grossG - reading.tareG - reading.actualMassG) > 1e-9 * Math.max(1, reading.grossG)
        ) {
          issues.push({
            path: `readings.${index}.actualMassG`,
            // The difference as typed, without binary remainders (12.34597 − 12.18577 is 0.1602, not 0.160200000000001).
            message: `Gross − tare is ${Number((reading.grossG - reading.tareG).toPrecision(12))} g, not ${reading.actualMassG} g.`,
          });
          return;
        }
        // The planned value: the first reading's planned value if readings are being corrected.
        const plannedG =
          previous?.readings.find((r) => r.stepIndex === reading.stepIndex)?.plannedG ?? Number(step[field]);
        recorded.push({
          stepIndex: reading.stepIndex,
          field,
          plannedG,
          actualG: reading.actualMassG,
          tareG: reading.tareG ?? null,
          grossG: reading.grossG ?? null,
        });
        step[field] = reading.actualMassG;
      });
      if (issues.length > 0) throw validationError(issues[0].message, issues);
      const computed = await compute(
        labId,
        plan as Record<string, unknown>,
        JSON.parse(current.overrides_json),
        Number(current.seed),
        signal,
      );
      if (computed.problem_json) {
        const problem = JSON.parse(computed.problem_json) as PlanProblem;
        throw new AppError(
          'validation',
          'plan_invalid',
          `With these readings the budget cannot be computed: ${problem.message}`,
          [{ path: ['plan', ...problem.path].join('.'), message: problem.message }],
        );
      }
      const { materialCode, ...write } = computed;
      const readings: RecordedReadings = {
        recordedAt: write.updated_at,
        recordedBy: actor.name,
        deviations: input.deviations,
        readings: recorded,
      };
      await transact(async (trx) => {
        const changed = await preparations.recordReadings(
          current.id,
          { ...write, readings_json: JSON.stringify(readings) },
          trx,
        );
        if (changed === 0) throw conflict('not_draft', `Version ${number} changed meanwhile; reload it.`);
        await preparations.touchPreparation(
          id,
          { title: prep.title, analyte: prep.analyte, materialCode, at: write.updated_at },
          trx,
        );
        await audit.record(
          {
            labId,
            actorUserId: actor.id,
            action: 'preparation.prepared',
            entityType: 'preparation',
            entityId: id,
            summary: `${actor.name} recorded the readings of version ${number} of “${prep.title}”: ${write.result_statement}${input.deviations ? `; deviations: ${input.deviations}` : ''}`,
            before: { statement: current.result_statement, readings: previous?.readings ?? null },
            after: { statement: write.result_statement, readings: recorded },
          },
          trx,
        );
      });
      return detail(labId, id, actor);
    },

    /** A new preparation with a copy of this one's plan, for comparing variants. */
    async duplicate(
      labId: number,
      actor: LabActor,
      id: number,
      title?: string,
      signal?: AbortSignal,
    ): Promise<PreparationDetail> {
      const prep = await findPreparation(preparations, labId, id);
      const [latest] = await preparations.versionsOf(id);
      return this.create(
        labId,
        actor,
        {
          title: title ?? `${prep.title} (variant)`.slice(0, 200),
          plan: JSON.parse(latest.plan_json),
          overrides: JSON.parse(latest.overrides_json),
          seed: Number(latest.seed),
        },
        signal,
      );
    },
  };
}
export type PreparationsService = ReturnType<typeof preparationsService>;
