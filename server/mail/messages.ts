import { ROLE_LABELS, type Role } from '../../shared/contracts/roles';

const escapeHtml = (text: string) =>
  text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);

function layout(paragraphs: string[], link: { href: string; label: string }): { text: string; html: string } {
  const text = [...paragraphs, '', `${link.label}: ${link.href}`, '', '— Dilutrace'].join('\n');
  const html = [
    '<div style="font-family:sans-serif;color:#17323b;max-width:560px">',
    ...paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`),
    `<p><a href="${escapeHtml(link.href)}">${escapeHtml(link.label)}</a></p>`,
    `<p style="color:#5b6b70;font-size:12px">${escapeHtml(link.href)}</p>`,
    '<p>— Dilutrace</p></div>',
  ].join('\n');
  return { text, html };
}

export function invitationMessage(input: {
  name: string;
  labName: string;
  role: Role;
  invitedBy: string;
  link: string;
  expiresAt: string;
  /** The e-mail already has an account: the person signs in to accept, and sets no password. */
  existingAccount: boolean;
}) {
  return {
    subject: `You are invited to ${input.labName} on Dilutrace`,
    ...layout(
      [
        `Hello ${input.name},`,
        `${input.invitedBy} has invited you to join ${input.labName} on Dilutrace as ${ROLE_LABELS[input.role].toLowerCase()}.`,
        input.existingAccount
          ? `You already have a Dilutrace account: open the link below and sign in as usual to accept. It works once and expires on ${input.expiresAt.slice(0, 10)}.`
          : `Open the link below to set your password. It works once and expires on ${input.expiresAt.slice(0, 10)}.`,
      ],
      { href: input.link, label: 'Accept the invitation' },
    ),
  };
}

export function passwordResetMessage(input: { name: string; link: string }) {
  return {
    subject: 'Reset your Dilutrace password',
    ...layout(
      [
        `Hello ${input.name},`,
        'Someone asked to reset the password of your Dilutrace account. If it was you, open the link below within one hour to choose a new password.',
        'If it was not you, ignore this message; your password stays as it is.',
      ],
      { href: input.link, label: 'Choose a new password' },
    ),
  };
}

export function submittedMessage(input: {
  reviewerName: string;
  analyst: string;
  title: string;
  version: number;
  /** The result as the record states it (resultStatement): the statement and, for a Monte Carlo interval, why. */
  statement: { text: string; reason: string | null };
  comment: string;
  link: string;
}) {
  return {
    subject: `Review requested: ${input.title} (version ${input.version})`,
    ...layout(
      [
        `Hello ${input.reviewerName},`,
        `${input.analyst} has submitted version ${input.version} of “${input.title}” for review.`,
        `Result: ${input.statement.text}`,
        ...(input.statement.reason ? [input.statement.reason] : []),
        ...(input.comment ? [`Note from ${input.analyst}: ${input.comment}`] : []),
      ],
      { href: input.link, label: 'Open the record' },
    ),
  };
}

export function decisionMessage(input: {
  analystName: string;
  reviewer: string;
  title: string;
  version: number;
  decision: 'approved' | 'returned';
  comment: string;
  link: string;
}) {
  const approved = input.decision === 'approved';
  return {
    subject: `${approved ? 'Approved' : 'Returned'}: ${input.title} (version ${input.version})`,
    ...layout(
      [
        `Hello ${input.analystName},`,
        approved
          ? `${input.reviewer} approved version ${input.version} of “${input.title}”. The approved record can no longer change; later changes go into a new version.`
          : `${input.reviewer} returned version ${input.version} of “${input.title}” with comments. You can change it and submit it again.`,
        `${approved ? 'Statement' : 'Comments'}: ${input.comment}`,
      ],
      { href: input.link, label: 'Open the record' },
    ),
  };
}
