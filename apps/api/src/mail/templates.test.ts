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
});
