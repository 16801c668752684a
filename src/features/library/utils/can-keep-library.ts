import type { Role } from '../../../../shared/contracts/roles';

/** QA keeps the library, and lab administrators may too (the server's rule); everyone else reads it. */
export const canKeepLibrary = (roles: readonly Role[]) => roles.includes('qa') || roles.includes('admin');
