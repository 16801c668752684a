import type { Request, RequestHandler } from 'express';
import { idParam } from '../../shared/contracts/auth';
import { can, type Permission } from '../../shared/contracts/permissions';
import type { Role } from '../../shared/contracts/roles';
import { forbidden, notFound, unauthenticated } from '../lib/errors';
import type { LabsRepository } from '../labs/labs-repository';
import type { UsersRepository } from './users-repository';

export interface SessionUser {
  id: number;
  email: string;
  name: string;
}

export interface LabContext {
  id: number;
  roles: Role[];
}

/** The signed-in user with their roles in the request's lab (on routes behind `authorize.lab`). */
export type LabActor = SessionUser & { roles: readonly Role[] };
export const labActor = (req: Request): LabActor => ({
  ...(req.user as SessionUser),
  roles: (req.lab as LabContext).roles,
});

declare module 'express-serve-static-core' {
  interface Request {
    /** Set by `authorize` on routes under /api/labs/:labId. */
    lab?: LabContext;
  }
}

declare global {
  namespace Express {
    // passport's req.user
    interface User extends SessionUser {}
  }
}

/**
 * The one authorization check every protected route uses.
 * - `authorize.signedIn`: any signed-in, active user.
 * - `authorize.lab(permission)`: the route has `:labId`; the user must be a member of that lab and hold
 *   a role that grants `permission` (shared/contracts/permissions.ts), or any role for 'member'. A lab the user is not in answers 404,
 *   so its existence is not revealed.
 * - `authorize.operator`: the instance operator, a flag on the account held outside every lab's roles.
 */
export function createAuthorize(labs: LabsRepository, users: UsersRepository) {
  const signedIn: RequestHandler = (req, _res, next) => {
    if (!req.user) throw unauthenticated();
    next();
  };
  const lab =
    (permission: Permission | 'member'): RequestHandler =>
    async (req, _res, next) => {
      if (!req.user) throw unauthenticated();
      const parsed = idParam.safeParse(req.params.labId);
      if (!parsed.success) throw notFound('The lab');
      const held = await labs.rolesOf(req.user.id, parsed.data);
      if (held.length === 0) throw notFound('The lab');
      if (permission !== 'member' && !can(held, permission)) throw forbidden();
      req.lab = { id: parsed.data, roles: held };
      next();
    };
  const operator: RequestHandler = async (req, _res, next) => {
    if (!req.user) throw unauthenticated();
    if (!(await users.isOperator(req.user.id))) throw forbidden('Only the instance operator may do this.');
    next();
  };
  return { signedIn, lab, operator };
}
export type Authorize = ReturnType<typeof createAuthorize>;
