import { DEFAULT_LAB_POLICY, labPolicySchema, type LabPolicy } from '../../shared/contracts/library';
import type { AuditRepository } from '../audit/audit-repository';
import type { SessionUser } from '../auth/authorize';
import type { PolicyRepository } from './policy-repository';
import type { Transact } from '../db/transaction';

export interface StoredPolicy extends LabPolicy {
  updatedAt: string | null;
  updatedBy: string | null;
}

/** Each lab's policy for budgets; a lab that never set one gets DEFAULT_LAB_POLICY. */
export function policyService(deps: {
  transact: Transact;
  policies: PolicyRepository;
  audit: AuditRepository;
  now: () => Date;
}) {
  const { transact, policies, audit, now } = deps;

  async function read(labId: number): Promise<StoredPolicy> {
    const row = await policies.find(labId);
    if (!row) return { ...DEFAULT_LAB_POLICY, updatedAt: null, updatedBy: null };
    return {
      ...labPolicySchema.parse(JSON.parse(row.policy_json)),
      updatedAt: row.updated_at,
      updatedBy: row.updated_by_name,
    };
  }

  return {
    read,
    async update(labId: number, actor: SessionUser, policy: LabPolicy): Promise<StoredPolicy> {
      const before = await read(labId);
      const at = now().toISOString();
      await transact(async (trx) => {
        await policies.save({ labId, policyJson: JSON.stringify(policy), updatedAt: at, updatedBy: actor.id }, trx);
        const { updatedAt: _a, updatedBy: _b, ...previous } = before;
        await audit.record(
          {
            labId,
            actorUserId: actor.id,
            action: 'policy.updated',
            entityType: 'lab_policy',
            entityId: labId,
            summary: `${actor.name} changed the lab policy`,
            before: previous,
            after: policy,
          },
          trx,
        );
      });
      return read(labId);
    },
  };
}
export type PolicyService = ReturnType<typeof policyService>;
