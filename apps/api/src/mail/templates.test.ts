import { describe, expect, it } from 'vitest';
import { mails } from './templates';

const context = {
  projectNumber: 'LAM-2026-014',
  projectName: 'Drying cabinet <B>',
  componentName: 'Door plate',
  revisionNumber: 3,
  url: 'http://127.0.0.1:8080/review/abc?x=1&y=2',
};

describe('mail templates', () => {
  it('name the revision in the subject and link to it', () => {
    const mail = mails.submittedForCheck(['checker@lab.example'], context, 'Dana Okafor');
    expect(mail.subject).toBe('Check requested: LAM-2026-014 Door plate rev 3');
    expect(mail.text).toContain('Dana Okafor has submitted LAM-2026-014 Door plate rev 3');
    expect(mail.text).toContain(context.url);
    expect(mail.to).toEqual(['checker@lab.example']);
  });

  it('escape what people typed in the HTML twin', () => {
    const mail = mails.returned(
      ['a@lab.example'],
      context,
      'Ravi',
      'see <script>alert(1)</script> & fix',
    );
    expect(mail.html).toContain('&lt;script&gt;');
    expect(mail.html).not.toContain('<script>');
    expect(mail.html).toContain('Drying cabinet &lt;B&gt;');
    expect(mail.html).toContain('href="http://127.0.0.1:8080/review/abc?x=1&amp;y=2"');
  });

  it('list a return’s remarks by step, escaped, with a link to each step; none, no heading', () => {
    const mail = mails.returned(['a@lab.example'], context, 'Ravi', 'See the remarks.', [
      { step: 7, text: 'k from Roark <table 11.4>' },
    ]);
    expect(mail.text).toContain('Remark on one step:');
    expect(mail.text).toContain(
      'Step 7: k from Roark <table 11.4> (http://127.0.0.1:8080/review/abc?x=1&y=2#trail-step-7)',
    );
    expect(mail.html).toContain('k from Roark &lt;table 11.4&gt;');
    const plain = mails.returned(['a@lab.example'], context, 'Ravi', 'See the remarks.');
    expect(plain.text).not.toMatch(/Remark/);
    expect(plain.text).toMatch(/qualified engineer/);
  });

  it('always carry the screening caution', () => {
    for (const mail of [
      mails.invitation('a@lab.example', 'Theo', 'http://x/accept', '2026-12-09T10:00:00.000Z'),
      mails.passwordReset('a@lab.example', 'http://x/reset', '2026-12-02T11:00:00.000Z'),
      mails.countersigned(['a@lab.example'], context, 'Ravi'),
    ]) {
      expect(mail.text).toMatch(/not a code calculation/);
      expect(mail.text).toMatch(/qualified engineer/);
    }
  });

  it('tell a new checker how many revisions wait, with a link to each, or that none does', () => {
    const waiting = [
      {
        componentName: 'Door plate',
        revisionNumber: 3,
        author: 'Dana',
        url: 'http://h/revisions/a',
      },
      { componentName: 'Lid', revisionNumber: 1, author: 'Ravi', url: 'http://h/revisions/b' },
    ];
    const project = { number: 'LAM-2026-014', name: 'Drying cabinet' };
    const mail = mails.checkerAdded(
      'c@lab.example',
      project,
      'Theo',
      waiting,
      'http://h/check-queue',
    );
    expect(mail.subject).toBe('You are a checker of LAM-2026-014: 2 waiting for a check');
    expect(mail.text).toContain('2 revisions are already waiting for a check:');
    expect(mail.text).toContain('LAM-2026-014 Door plate rev 3, by Dana: http://h/revisions/a');
    expect(mail.text).toContain('LAM-2026-014 Lid rev 1, by Ravi: http://h/revisions/b');
    const none = mails.checkerAdded('c@lab.example', project, 'Theo', [], 'http://h/check-queue');
    expect(none.subject).toBe('You are a checker of LAM-2026-014');
    expect(none.text).toContain('Nothing is waiting for a check yet');
    expect(none.text).not.toContain('/revisions/');
  });
});
