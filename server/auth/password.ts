import bcrypt from 'bcryptjs';

const COST = 11;

export const hashPassword = (password: string): Promise<string> => bcrypt.hash(password, COST);
export const verifyPassword = (password: string, hash: string): Promise<boolean> => bcrypt.compare(password, hash);

/** A hash of nothing, compared against when the e-mail is unknown so both paths take the same time. */
export const DUMMY_HASH = bcrypt.hashSync('no account has this password', COST);
