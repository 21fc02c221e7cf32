import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { simpleParser } from 'mailparser';
import type { StoredMailIndexLine } from '../src/mail/fake-smtp-server';

export interface ReceivedMail {
  readonly to: readonly string[];
  readonly subject: string;
  readonly text: string;
  readonly messageId: string;
  readonly outboxId: string;
}

/** Every mail the fake SMTP server has stored in `folder`, oldest first. */
export async function readMailbox(folder: string): Promise<ReceivedMail[]> {
  let index: string;
  try {
    index = await readFile(path.join(folder, 'index.jsonl'), 'utf8');
  } catch {
    return [];
  }
  const lines = index
    .split('\n')
    .filter(Boolean)
    .map((l) => JSON.parse(l) as StoredMailIndexLine);
  return Promise.all(
    lines.map(async (line) => {
      const parsed = await simpleParser(await readFile(path.join(folder, line.file)));
      const outboxHeader = parsed.headers.get('x-hoopline-outbox-id');
      return {
        to: line.to,
        subject: parsed.subject ?? '',
        text: parsed.text ?? '',
        messageId: parsed.messageId ?? '',
        outboxId: typeof outboxHeader === 'string' ? outboxHeader : '',
      };
    }),
  );
}
