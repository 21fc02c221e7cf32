import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { simpleParser } from 'mailparser';

/**
 * Reads the mail the e2e server sent, from the fake SMTP server's folder
 * (scripts/mail-fake.sh, test instance): one .eml per message and a line per
 * message in index.jsonl. HOOPLINE_E2E_MAIL_DIR points elsewhere.
 */
export const MAIL_FOLDER =
  process.env['HOOPLINE_E2E_MAIL_DIR'] ??
  path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../.data/mail-test');

interface IndexLine {
  readonly file: string;
  readonly from: string;
  readonly to: readonly string[];
  readonly receivedAt: string;
}

export interface ReceivedMail {
  readonly file: string;
  readonly subject: string;
  readonly text: string;
  readonly html: string;
  readonly to: readonly string[];
}

async function indexLines(): Promise<IndexLine[]> {
  let text: string;
  try {
    text = await readFile(path.join(MAIL_FOLDER, 'index.jsonl'), 'utf8');
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'ENOENT') return [];
    throw error;
  }
  // The last line may be half written while the server appends: skip what does not parse.
  return text
    .split('\n')
    .filter(Boolean)
    .flatMap((line) => {
      try {
        return [JSON.parse(line) as IndexLine];
      } catch {
        return [];
      }
    });
}

/**
 * Waits for a mail to `to` (the newest one whose subject matches, received
 * after `since` when given) and parses it. The API's mail worker polls its
 * outbox every 200 ms on the e2e server, so a mail arrives within a second.
 */
export async function waitForMail(
  to: string,
  options: { subject?: RegExp; since?: Date; timeoutMs?: number } = {},
): Promise<ReceivedMail> {
  const deadline = Date.now() + (options.timeoutMs ?? 15_000);
  const address = to.toLowerCase();
  for (;;) {
    const lines = (await indexLines())
      .filter((l) => l.to.some((t) => t.toLowerCase() === address))
      .filter((l) => !options.since || new Date(l.receivedAt) >= options.since)
      .reverse();
    for (const line of lines) {
      const parsed = await simpleParser(await readFile(path.join(MAIL_FOLDER, line.file)));
      const subject = parsed.subject ?? '';
      if (options.subject && !options.subject.test(subject)) continue;
      return {
        file: line.file,
        subject,
        text: parsed.text ?? '',
        html: typeof parsed.html === 'string' ? parsed.html : '',
        to: line.to,
      };
    }
    if (Date.now() > deadline) {
      throw new Error(
        `no mail to ${to}${options.subject ? ` matching ${options.subject}` : ''} in ${MAIL_FOLDER}`,
      );
    }
    await new Promise((resolve) => setTimeout(resolve, 150));
  }
}

/** The path of the first link in a mail's text whose path matches (`/invitation/…`). */
export function linkIn(mail: ReceivedMail, pathPattern: RegExp): string {
  for (const match of mail.text.matchAll(/https?:\/\/\S+/g)) {
    const url = new URL(match[0]);
    if (pathPattern.test(url.pathname)) return url.pathname;
  }
  throw new Error(`no link matching ${pathPattern} in the mail "${mail.subject}":\n${mail.text}`);
}
