import { auditRepository } from '../audit/audit-repository';
import { DatabaseSessionStore } from '../auth/session-store';
import { usersRepository } from '../auth/users-repository';
import { databaseTarget, loadEnv } from '../config/env';
import { openDatabase } from '../db/connection';
import { systemClock } from '../lib/clock';
import { AppError } from '../lib/errors';
import { outboxRepository } from '../mail/outbox-repository';
import { operatorService } from '../operator/operator-service';

const USAGE = `Usage: npm run operator -- <command> <email>
  disable-account <email>   switch the account off in every lab and end its sessions
  enable-account <email>    switch it on again
  grant <email>             make the account an instance operator
  revoke <email>            end its operator rights`;

/** `npm run operator -- …`: the instance operator's actions from the command line, each audited. */
const [command, email] = process.argv.slice(2);
const commands = ['disable-account', 'enable-account', 'grant', 'revoke'];
if (!command || !email || !commands.includes(command)) {
  console.error(USAGE);
  process.exit(2);
}
const db = await openDatabase(databaseTarget(loadEnv()));
try {
  const operator = operatorService({
    users: usersRepository(db),
    outbox: outboxRepository(db),
    audit: auditRepository(db, () => systemClock.now()),
    sessions: new DatabaseSessionStore(db, () => Date.now()),
  });
  const find = { email: email.toLowerCase() };
  const account =
    command === 'disable-account'
      ? await operator.disable('command line', find)
      : command === 'enable-account'
        ? await operator.enable('command line', find)
        : command === 'grant'
          ? await operator.grant('command line', find)
          : await operator.revoke('command line', find);
  console.log(
    `${account.email}: ${account.active ? 'active' : 'disabled'}${account.operator ? ', instance operator' : ''}; labs: ${account.labs.join(', ') || 'none'}.`,
  );
} catch (error) {
  if (!(error instanceof AppError)) throw error;
  console.error(error.message);
  process.exitCode = 1;
} finally {
  await db.destroy();
}
