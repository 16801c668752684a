import { auditRepository } from '../audit/audit-repository';
import type { Role } from '../../shared/contracts/roles';
import { hashPassword } from '../auth/password';
import type { Db } from './connection';
import { seedDemoLibrary } from './seed-demo-library';
import { insertedId } from './inserted-id';

/** The invented demo lab, a regional drinking-water laboratory. All names are made up. */
export const DEMO_LAB = {
  name: 'Wellmere Regional Water Laboratory',
  slug: 'wellmere-water',
  domain: 'wellmere-water.example',
};

/** The demo admin is also the instance operator (outside the lab's roles). */
export const DEMO_PEOPLE: { local: string; name: string; roles: Role[]; operator?: boolean }[] = [
  { local: 'admin', name: 'Rowan Achterberg', roles: ['admin'], operator: true },
  { local: 'qa', name: 'Imogen Tasker', roles: ['qa'] },
  { local: 'analyst', name: 'Dev Okonjo', roles: ['analyst'] },
  { local: 'analyst2', name: 'Lucía Ferreira-Blom', roles: ['analyst'] },
  { local: 'auditor', name: 'Harriet Vance', roles: ['auditor'] },
];

export const demoEmail = (local: string) => `${local}@${DEMO_LAB.domain}`;

export class SeedRefusedError extends Error {}

/** Creates the demo lab and its people in one transaction; refuses a database that already has users. */
export async function seedDemoLab(
  db: Db,
  options: { password: string; now: Date; certificateDir: string },
): Promise<{ labId: number }> {
  const passwordHash = await hashPassword(options.password);
  const at = options.now.toISOString();
  return db.transaction(async (trx) => {
    const users = Number((await trx('users').count({ n: '*' }).first())?.n ?? 0);
    if (users > 0)
      throw new SeedRefusedError('The database already has users; the demo lab is only seeded into an empty database.');
    const [lab] = await trx('labs')
      .insert({ name: DEMO_LAB.name, slug: DEMO_LAB.slug, created_at: at })
      .returning('id');
    const labId = insertedId(lab);
    const ids: Record<string, number> = {};
    for (const person of DEMO_PEOPLE) {
      const [user] = await trx('users')
        .insert({
          email: demoEmail(person.local),
          name: person.name,
          password_hash: passwordHash,
          active: true,
          operator: person.operator === true,
          created_at: at,
        })
        .returning('id');
      const userId = insertedId(user);
      ids[person.local] = userId;
      for (const role of person.roles)
        await trx('memberships').insert({ user_id: userId, lab_id: labId, role, created_at: at });
    }
    await seedDemoLibrary(trx, { labId, ownerId: ids.qa, now: options.now, certificateDir: options.certificateDir });
    await auditRepository(trx, () => options.now).record(
      {
        labId,
        actorUserId: null,
        action: 'lab.seeded',
        entityType: 'lab',
        entityId: labId,
        summary: 'Demo lab created by the seed command',
      },
      trx,
    );
    return { labId };
  });
}
