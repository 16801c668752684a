import type { ApprovedRecord, ReviewQueueItem, SnapshotVerification } from '../../shared/contracts/reviews';
import type { Review } from '../../shared/contracts/reviews';
import type { Db } from '../db/connection';
import type { VersionRow } from '../preparations/preparations-repository';
import { findVersion } from '../preparations/find-version';
import type { AuditRepository } from '../audit/audit-repository';
import type { SessionUser } from '../auth/authorize';
import {
  allows,
  isOwnWork,
  OWN_WORK_REVIEW_REFUSAL,
  ownsPreparation,
  statesAllowing,
  statusAfterWithdrawal,
} from '../../shared/domain/version-lifecycle';
import { lastSubmitterId, readingsRecorded } from '../preparations/version-facts';
import { verifyPassword } from '../auth/password';
import type { UsersRepository } from '../auth/users-repository';
import type { LabsRepository } from '../labs/labs-repository';
import { sha256Hex } from '../lib/canonical-json';
import { conflict, forbidden, validationError } from '../lib/errors';
import type { Mailer } from '../mail/mailer';
import { decisionMessage, submittedMessage } from '../mail/messages';
import type { PreparationsRepository } from '../preparations/preparations-repository';
import type { ReviewsRepository } from './reviews-repository';
import { approvedAsOf, approvedRecordSha256, toApprovedAsColumns, type ApprovedAs } from './approved-record';
import type { Transact } from '../db/transaction';
import { readStoredSnapshot } from '../preparations/stored-snapshot';
import { resultStatement } from '../../shared/uncertainty';

/** 'a, b or c'. */
const listOf = (words: readonly string[]) =>
  words.length > 1 ? `${words.slice(0, -1).join(', ')} or ${words[words.length - 1]}` : words.join('');

/** The plan document's own title, if it has one. */
function planTitle(planJson: string): string | null {
  const title = (JSON.parse(planJson) as { title?: unknown }).title;
  return typeof title === 'string' && title.trim() ? title.trim().slice(0, 200) : null;
}

/**
 * The review workflow of a computed version: draft or returned → submitted (its author) → approved
 * (signed with the reviewer's password) or returned with comments (QA, never the submitter), or
 * withdrawn by its analyst before QA decides.
 */
export function reviewService(deps: {
  transact: Transact;
  preparations: PreparationsRepository;
  reviews: ReviewsRepository;
  users: UsersRepository;
  labs: LabsRepository;
  audit: AuditRepository;
  mailer: Mailer;
  now: () => Date;
  publicUrl: (path: string) => string;
  log: (message: string, error?: unknown) => void;
}) {
  const { transact, preparations, reviews, users, labs, audit, mailer, now } = deps;

  /** A step of the review (submitted, withdrawn, approved, returned): its append-only review row and its audit event, in one transaction. */
  async function recordReviewStep(
    trx: Db,
    step: {
      labId: number;
      actor: SessionUser;
      preparationId: number;
      version: VersionRow;
      action: Review['action'];
      at: string;
      comment: string;
      recordSha256?: string | null;
      summary: string;
      before: unknown;
      after: unknown;
    },
  ): Promise<void> {
    await preparations.insertReview(
      {
        version_id: step.version.id,
        action: step.action,
        actor_user_id: step.actor.id,
        at: step.at,
        comment: step.comment,
        snapshot_sha256: step.version.snapshot_sha256,
        ...(step.recordSha256 === undefined ? {} : { record_sha256: step.recordSha256 }),
      },
      trx,
    );
    await audit.record(
      {
        labId: step.labId,
        actorUserId: step.actor.id,
        action: `preparation.${step.action}`,
        entityType: 'preparation',
        entityId: step.preparationId,
        summary: step.summary,
        before: step.before,
        after: step.after,
      },
      trx,
    );
  }

  /** Mail goes out after the change is committed; a mail failure is logged, never undoes a decision. */
  async function notify(send: () => Promise<void>) {
    try {
      await send();
    } catch (error) {
      deps.log('Notification mail failed', error);
    }
  }

  return {
    async submit(
      labId: number,
      actor: SessionUser,
      preparationId: number,
      number: number,
      comment: string,
    ): Promise<void> {
      const { prep, version } = await findVersion(preparations, labId, preparationId, number);
      if (!ownsPreparation(actor, { ownerId: prep.created_by }))
        throw forbidden('Only the analyst who owns this preparation can submit it.');
      if (!allows('submit', version.status))
        throw conflict(
          'not_draft',
          `Version ${number} is ${version.status}; only a ${listOf(statesAllowing('submit'))} version can be submitted.`,
        );
      if (!version.snapshot_json)
        throw validationError(
          'This version has no computed budget yet: fix the problem shown in the plan, then submit.',
        );
      const at = now().toISOString();
      await transact(async (trx) => {
        if ((await preparations.transition(version.id, version.status, 'submit', trx)) === 0)
          throw conflict('not_draft', 'The version changed meanwhile; reload it.');
        await recordReviewStep(trx, {
          labId,
          actor,
          preparationId,
          version,
          action: 'submitted',
          at,
          comment,
          summary: `${actor.name} submitted version ${number} of “${prep.title}”`,
          before: { status: version.status },
          after: { status: 'submitted' },
        });
      });
      // The result in the words of the record page and the PDF, stated from the stored numbers.
      const statement = resultStatement(readStoredSnapshot(version.snapshot_json));
      const reviewers = (await labs.members(labId)).filter(
        (m) => m.role === 'qa' && m.active && m.user_id !== actor.id,
      );
      for (const reviewer of reviewers) {
        await notify(() =>
          mailer.send({
            to: reviewer.email,
            labId,
            ...submittedMessage({
              reviewerName: reviewer.name,
              analyst: actor.name,
              title: prep.title,
              version: number,
              statement,
              comment,
              link: deps.publicUrl(`/records/${preparationId}/v/${number}`),
            }),
          }),
        );
      }
    },

    /**
     * The owner takes a submitted version back before QA decides: it returns to prepared or draft (the
     * lifecycle says which) and leaves QA's queue. QA is not mailed; the audit event and the record's
     * review history say it was withdrawn.
     */
    async withdraw(
      labId: number,
      actor: SessionUser,
      preparationId: number,
      number: number,
      comment: string,
    ): Promise<void> {
      const { prep, version } = await findVersion(preparations, labId, preparationId, number);
      if (!ownsPreparation(actor, { ownerId: prep.created_by }))
        throw forbidden('Only the analyst who owns this preparation can withdraw it from review.');
      const decided = `Version ${number} is ${version.status}; only a submitted version can be withdrawn from review.`;
      if (!allows('withdraw', version.status)) throw conflict('not_submitted', decided);
      const to = statusAfterWithdrawal({ readingsRecorded: readingsRecorded(version) });
      await transact(async (trx) => {
        if ((await preparations.withdraw(version.id, to, trx)) === 0)
          throw conflict('not_submitted', 'QA decided on this version meanwhile; it can no longer be withdrawn.');
        await recordReviewStep(trx, {
          labId,
          actor,
          preparationId,
          version,
          action: 'withdrawn',
          at: now().toISOString(),
          comment,
          summary: `${actor.name} withdrew version ${number} of “${prep.title}” from review${comment ? `: ${comment}` : ''}`,
          before: { status: 'submitted' },
          after: { status: to },
        });
      });
    },

    async decide(
      labId: number,
      actor: SessionUser,
      preparationId: number,
      number: number,
      decision: { kind: 'approved'; password: string; statement: string } | { kind: 'returned'; comment: string },
    ): Promise<void> {
      const { prep, version } = await findVersion(preparations, labId, preparationId, number);
      const transition = decision.kind === 'approved' ? 'approve' : 'return';
      const reviews = await preparations.reviewsOf(version.id);
      if (!allows(transition, version.status)) {
        const withdrawn = version.status !== 'approved' && reviews.at(-1)?.action === 'withdrawn';
        throw conflict(
          'not_submitted',
          withdrawn
            ? `Version ${number} was withdrawn from review by its analyst and is back with them; there is nothing to review until it is submitted again.`
            : `Version ${number} is ${version.status}; only a submitted version can be reviewed.`,
        );
      }
      const submitterId = lastSubmitterId(reviews);
      if (isOwnWork(actor, { ownerId: prep.created_by, submitterId })) throw forbidden(OWN_WORK_REVIEW_REFUSAL);
      if (decision.kind === 'approved') {
        const account = await users.findById(actor.id);
        if (!account || !(await verifyPassword(decision.password, account.password_hash))) {
          await audit.record({
            labId,
            actorUserId: actor.id,
            action: 'preparation.approval_refused',
            entityType: 'preparation',
            entityId: preparationId,
            summary: `Approval of “${prep.title}” v${number} refused: password not confirmed`,
          });
          throw validationError('The password is not right; the approval was not signed.', [
            { path: 'password', message: 'This is not your password.' },
          ]);
        }
        if (!version.snapshot_json || sha256Hex(version.snapshot_json) !== version.snapshot_sha256)
          throw conflict(
            'snapshot_mismatch',
            'The stored snapshot does not match its hash; it cannot be approved. Tell your administrator.',
          );
      }
      const at = now().toISOString();
      const comment = decision.kind === 'approved' ? decision.statement : decision.comment;
      // What the record shows is frozen with the signature and covered by the hash signed.
      const approvedAs: ApprovedAs | null =
        decision.kind === 'approved'
          ? {
              title: prep.title,
              analyte: prep.analyte,
              preparationName: planTitle(version.plan_json) ?? prep.title,
              labName: (await labs.findById(labId))?.name ?? '',
            }
          : null;
      const recordSha256 =
        approvedAs && version.snapshot_sha256 ? approvedRecordSha256(version.snapshot_sha256, approvedAs) : null;
      await transact(async (trx) => {
        const changed =
          approvedAs && recordSha256
            ? await preparations.approve(
                version.id,
                { ...toApprovedAsColumns(approvedAs), record_sha256: recordSha256 },
                trx,
              )
            : await preparations.transition(version.id, version.status, 'return', trx);
        if (changed === 0) throw conflict('not_submitted', 'The version changed meanwhile; reload it.');
        await recordReviewStep(trx, {
          labId,
          actor,
          preparationId,
          version,
          action: decision.kind,
          at,
          comment,
          recordSha256,
          summary: `${actor.name} ${decision.kind} version ${number} of “${prep.title}”: ${comment}`,
          before: { status: 'submitted' },
          after: {
            status: decision.kind,
            snapshotSha256: version.snapshot_sha256,
            ...(recordSha256 ? { recordSha256, approvedAs } : {}),
          },
        });
      });
      const analyst = await users.findById(prep.created_by);
      if (analyst?.active) {
        await notify(() =>
          mailer.send({
            to: analyst.email,
            labId,
            ...decisionMessage({
              analystName: analyst.name,
              reviewer: actor.name,
              title: prep.title,
              version: number,
              decision: decision.kind,
              comment,
              link: deps.publicUrl(`/records/${preparationId}/v/${number}`),
            }),
          }),
        );
      }
    },

    async queue(labId: number): Promise<ReviewQueueItem[]> {
      const rows = await reviews.submissions(labId);
      const latest = new Map<number, (typeof rows)[number]>();
      for (const row of rows) latest.set(row.id, row);
      const t = now().getTime();
      return [...latest.values()].map((row) => ({
        preparationId: row.preparation_id,
        title: row.title,
        versionNumber: row.number,
        submittedBy: row.submitted_by,
        submittedAt: row.submitted_at,
        waitingHours: Math.max(0, (t - Date.parse(row.submitted_at)) / 3_600_000),
        resultStatement: row.result_statement,
        comment: row.comment,
      }));
    },

    /** Approved versions, newest first; title and analyte are the frozen ones where the version has them. */
    async approvedRecords(labId: number, q?: string): Promise<ApprovedRecord[]> {
      const rows = await reviews.approved(labId, q);
      return rows.map((r) => ({
        preparationId: r.preparation_id,
        title: r.title,
        analyte: r.analyte,
        versionNumber: r.number,
        analyst: r.analyst,
        approvedBy: r.approved_by,
        approvedAt: r.approved_at,
        resultStatement: r.result_statement,
        snapshotSha256: r.snapshot_sha256,
      }));
    },

    /**
     * Recomputes the SHA-256 of the stored snapshot and compares it with the hash stored and the hash
     * signed; for a version approved with frozen fields, also the record hash that covers them.
     */
    async verify(labId: number, preparationId: number, number: number): Promise<SnapshotVerification> {
      const { version } = await findVersion(preparations, labId, preparationId, number);
      if (!version.snapshot_json) throw validationError('This version has no computed snapshot to verify.');
      const computedSha256 = sha256Hex(version.snapshot_json);
      const approval = (await preparations.reviewsOf(version.id)).find((r) => r.action === 'approved');
      const approvedSha256 = approval?.snapshot_sha256 ?? null;
      const snapshotIntact =
        computedSha256 === version.snapshot_sha256 && (approvedSha256 === null || approvedSha256 === computedSha256);
      const approvedAs = approvedAsOf(version);
      const record =
        approvedAs || version.record_sha256 || approval?.record_sha256
          ? {
              computedSha256: approvedAs ? approvedRecordSha256(computedSha256, approvedAs) : null,
              storedSha256: version.record_sha256,
              approvedSha256: approval?.record_sha256 ?? null,
            }
          : null;
      const recordIntact =
        record === null ||
        (record.computedSha256 !== null &&
          record.computedSha256 === record.storedSha256 &&
          record.computedSha256 === record.approvedSha256);
      const intact = snapshotIntact && recordIntact;
      return {
        computedSha256,
        storedSha256: version.snapshot_sha256,
        approvedSha256,
        record,
        intact,
        message: !snapshotIntact
          ? 'The stored snapshot does NOT match its recorded hash: the record has been altered since it was computed or signed.'
          : !recordIntact
            ? 'The title, analyte, preparation name or lab name stored with the approval does NOT match the signed hash: the record has been altered since it was signed.'
            : approvedSha256
              ? 'The stored snapshot is exactly the one that was approved.'
              : 'The stored snapshot matches its recorded hash.',
      };
    },
  };
}
export type ReviewService = ReturnType<typeof reviewService>;
