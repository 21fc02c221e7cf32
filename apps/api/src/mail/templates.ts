/**
 * The mails Hoopline sends, as plain text with a simple HTML twin. Each says
 * what happened, what to do and where; none carries numbers the reader might
 * act on without opening the checked record.
 */
export interface MailMessage {
  readonly to: readonly string[];
  readonly subject: string;
  readonly text: string;
  readonly html: string;
}

const SIGNATURE =
  '— Hoopline\nScreening records for pressure and vacuum equipment. A screening is not a code calculation; ' +
  'the applicable code and a qualified engineer decide.';

function escapeHtml(text: string): string {
  return text.replace(
    /[&<>"']/g,
    (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!,
  );
}

function compose(
  to: readonly string[],
  subject: string,
  paragraphs: readonly string[],
  link?: { label: string; url: string },
): MailMessage {
  const text = [...paragraphs, ...(link ? [`${link.label}: ${link.url}`] : []), SIGNATURE].join(
    '\n\n',
  );
  const html = [
    ...paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`),
    ...(link ? [`<p><a href="${escapeHtml(link.url)}">${escapeHtml(link.label)}</a></p>`] : []),
    `<p style="color:#64748b">${escapeHtml(SIGNATURE).replace('\n', '<br>')}</p>`,
  ].join('\n');
  return { to, subject, text, html };
}

export interface RevisionMailContext {
  readonly projectNumber: string;
  readonly projectName: string;
  readonly componentName: string;
  readonly revisionNumber: number;
  readonly url: string;
}

function revisionLabel(c: RevisionMailContext): string {
  return `${c.projectNumber} ${c.componentName} rev ${c.revisionNumber}`;
}

/** One revision waiting on a check, for the mail to a new checker. */
export interface WaitingRevision {
  readonly componentName: string;
  readonly revisionNumber: number;
  readonly author: string;
  readonly url: string;
}

export const mails = {
  invitation(to: string, invitedBy: string, url: string, expiresAt: string): MailMessage {
    return compose(
      [to],
      'You are invited to Hoopline',
      [
        `${invitedBy} has invited you to Hoopline, where pressure and vacuum equipment screenings are prepared, checked and issued.`,
        `The invitation can be used once and expires ${expiresAt.slice(0, 16).replace('T', ' ')} UTC.`,
      ],
      { label: 'Accept the invitation', url },
    );
  },

  passwordReset(to: string, url: string, expiresAt: string): MailMessage {
    return compose(
      [to],
      'Reset your Hoopline password',
      [
        'Someone asked to reset the password of your Hoopline account. If it was not you, ignore this mail: nothing changes.',
        `The link can be used once and expires ${expiresAt.slice(0, 16).replace('T', ' ')} UTC.`,
      ],
      { label: 'Choose a new password', url },
    );
  },

  submittedForCheck(to: readonly string[], c: RevisionMailContext, author: string): MailMessage {
    return compose(
      to,
      `Check requested: ${revisionLabel(c)}`,
      [
        `${author} has submitted ${revisionLabel(c)} (${c.projectName}) for check.`,
        'It is in your check queue: read the trail, then countersign or return it with your comments.',
      ],
      { label: 'Open the review', url: c.url },
    );
  },

  countersigned(to: readonly string[], c: RevisionMailContext, checker: string): MailMessage {
    return compose(
      to,
      `Countersigned: ${revisionLabel(c)}`,
      [
        `${checker} has countersigned ${revisionLabel(c)} (${c.projectName}).`,
        'Its stamped-for-review sheet can now be downloaded by the project’s fabricators. It is for review, not for construction.',
      ],
      { label: 'Open the revision', url: c.url },
    );
  },

  /**
   * To a person who has just become a checker of a project: who made them one
   * and the revisions already waiting (a count and a link to each), or that
   * nothing waits yet.
   */
  checkerAdded(
    to: string,
    project: { number: string; name: string },
    addedBy: string,
    waiting: readonly WaitingRevision[],
    queueUrl: string,
  ): MailMessage {
    const where = `${project.number} (${project.name})`;
    const count =
      waiting.length === 0
        ? 'Nothing is waiting for a check yet: you will get a mail when a revision is submitted.'
        : waiting.length === 1
          ? '1 revision is already waiting for a check:'
          : `${waiting.length} revisions are already waiting for a check:`;
    const list = waiting.map(
      (w) =>
        `${project.number} ${w.componentName} rev ${w.revisionNumber}, by ${w.author}: ${w.url}`,
    );
    return compose(
      [to],
      waiting.length === 0
        ? `You are a checker of ${project.number}`
        : `You are a checker of ${project.number}: ${waiting.length} waiting for a check`,
      [
        `${addedBy} has made you a checker of ${where}. Checkers countersign or return the revisions the project’s designers submit; nobody checks their own work.`,
        count,
        ...list,
      ],
      { label: 'Open your check queue', url: queueUrl },
    );
  },

  /**
   * To the author of a returned revision: the checker's comment, and each
   * remark with its trail step and a link to that step on the revision page.
   */
  returned(
    to: readonly string[],
    c: RevisionMailContext,
    checker: string,
    comment: string,
    remarks: readonly { step: number; text: string }[] = [],
  ): MailMessage {
    const byStep = [...remarks].sort((a, b) => a.step - b.step);
    return compose(
      to,
      `Returned with comments: ${revisionLabel(c)}`,
      [
        `${checker} has returned ${revisionLabel(c)} (${c.projectName}).`,
        `Comment: ${comment}`,
        ...(byStep.length === 0
          ? []
          : [
              byStep.length === 1 ? 'Remark on one step:' : `Remarks on ${byStep.length} steps:`,
              ...byStep.map((r) => `Step ${r.step}: ${r.text} (${c.url}#trail-step-${r.step})`),
            ]),
      ],
      { label: 'Open the revision', url: c.url },
    );
  },
};
