import { AUDIT_ACTIONS, type AuditEvent } from '@hoopline/contract';
import { describe, expect, it } from 'vitest';
import { AUDIT_ACTION_LABELS, auditActionLabel, auditSegments, auditSentence } from './audit-words';

const dana = { id: '00000000-0000-4000-8000-000000000001', name: 'Dana Okafor' };
const theo = { id: '00000000-0000-4000-8000-000000000002', name: 'Theo Brandt' };
const target: AuditEvent['target'] = {
  project: { id: '00000000-0000-4000-8000-0000000000a1', number: 'P-104', name: 'Drying line' },
  component: { id: '00000000-0000-4000-8000-0000000000c1', tag: 'D-2', name: 'Door' },
  revision: { id: '00000000-0000-4000-8000-0000000000e1', number: 3 },
  person: theo,
  fileName: 'door.pdf',
};
const event = (action: string, over: Partial<AuditEvent> = {}) => ({
  actor: dana,
  action,
  target,
  summary: {},
  ...over,
});

describe('audit words', () => {
  it('has words and a label for every action code the API writes', () => {
    for (const code of AUDIT_ACTIONS) {
      const sentence = auditSentence(event(code));
      // A code without words falls back to ": <code>"; every listed one must have its own.
      expect(sentence, code).not.toContain(code);
      expect(sentence.length, code).toBeGreaterThan(8);
      expect(AUDIT_ACTION_LABELS[code], code).toBeTruthy();
      expect(auditActionLabel(code)).not.toBe(code);
    }
    expect(Object.keys(AUDIT_ACTION_LABELS).sort()).toEqual([...AUDIT_ACTIONS].sort());
  });

  it('gives each code a different sentence', () => {
    const sentences = AUDIT_ACTIONS.map((code) => auditSentence(event(code)));
    expect(new Set(sentences).size).toBe(AUDIT_ACTIONS.length);
  });

  it('names the revision and the component of a countersigning', () => {
    expect(auditSentence(event('revision.countersigned'))).toBe(
      'Dana Okafor countersigned revision 3 of Door D-2',
    );
    expect(auditSentence(event('revision.returned'))).toBe(
      'Dana Okafor returned revision 3 of Door D-2 to the designer',
    );
    expect(auditSentence(event('revision.sign_off_refused'))).toBe(
      'Dana Okafor tried to sign off revision 3 of Door D-2 with a wrong password (refused)',
    );
    expect(auditSentence(event('sheet.downloaded'))).toBe(
      'Dana Okafor downloaded the sheet of revision 3 of Door D-2',
    );
  });

  it('links the actor, the revision and the component', () => {
    const linked = auditSegments(event('revision.submitted')).filter((s) => s.link);
    expect(linked).toEqual([
      { text: 'Dana Okafor', link: { kind: 'person', id: dana.id } },
      { text: 'revision 3', link: { kind: 'revision', id: target.revision!.id } },
      { text: 'Door D-2', link: { kind: 'component', id: target.component!.id } },
    ]);
  });

  it('names the project, the person and the role of a member event', () => {
    expect(auditSentence(event('member.set', { summary: { after: { role: 'checker' } } }))).toBe(
      'Dana Okafor made Theo Brandt a member of P-104 Drying line, as Checker',
    );
    expect(auditSentence(event('member.removed'))).toBe(
      'Dana Okafor removed Theo Brandt from P-104 Drying line',
    );
    const project = auditSegments(event('project.created')).find((s) => s.link?.kind === 'project');
    expect(project).toEqual({
      text: 'P-104 Drying line',
      link: { kind: 'project', id: target.project!.id },
    });
  });

  it('falls back when records are gone: the stored revision number, plain words, no links', () => {
    const gone = {
      ...event('revision.created', {
        target: { project: null, component: null, revision: null, person: null, fileName: null },
        summary: { after: { number: 7 } },
      }),
      actor: null,
    };
    expect(auditSentence(gone)).toBe('The system saved revision 7 of a component');
    expect(auditSegments(gone).some((s) => s.link)).toBe(false);
    expect(auditSentence({ ...gone, action: 'invitation.created' })).toBe(
      'The system invited someone',
    );
  });

  it('shows a code this version does not know (an old row) as the code', () => {
    expect(auditSentence(event('role.granted'))).toBe('Dana Okafor: role.granted');
    expect(auditActionLabel('role.granted')).toBe('role.granted');
  });

  it('does not link an invitee who has not accepted yet', () => {
    const invite = event('invitation.created', {
      target: { ...target, person: { id: null, name: 'Ravi Lindqvist' } },
    });
    expect(auditSentence(invite)).toBe('Dana Okafor invited Ravi Lindqvist');
    expect(auditSegments(invite).find((s) => s.text === 'Ravi Lindqvist')?.link).toBeUndefined();
  });
});
