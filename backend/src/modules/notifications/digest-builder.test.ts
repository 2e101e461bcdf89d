import { describe, expect, it } from 'vitest';
import { buildDigest, type DigestInput } from './digest-builder.js';

const base: DigestInput = {
  docSetName: 'Handbook',
  runUrl: 'http://localhost:3000/doc-sets/x/runs',
  finishedAt: '2026-12-01T02:00:00Z',
  pageCount: 300,
  changes: [],
  scoreMoves: [],
  tasksVerified: [],
  tasksOverdue: [],
  pruningWaiting: 0,
};

describe('the nightly digest', () => {
  it('says plainly when nothing changed', () => {
    const mail = buildDigest(base);
    expect(mail.nothingChanged).toBe(true);
    expect(mail.subject).toBe('Linkloom nightly: Handbook — nothing changed');
    expect(mail.text).toContain('Nothing changed since the previous run.');
  });

  it('carries the same numbers in the subject, text and HTML, and lists at most ten items', () => {
    const appeared = Array.from({ length: 12 }, (_, i) => `guide/p${i}.md -> missing.md`);
    const mail = buildDigest({
      ...base,
      changes: [{ label: 'Broken links', appeared, appearedTotal: 12, disappeared: ['a.md -> b.md'], disappearedTotal: 1 }],
      pruningWaiting: 2,
    });
    expect(mail.subject).toContain('Broken links +11');
    expect(mail.text).toContain('Broken links: 12 new, 1 gone');
    expect(mail.html).toContain('Broken links: 12 new, 1 gone');
    expect(mail.text).toContain('and 2 more');
    expect(mail.text.match(/ {2}new: /g)).toHaveLength(10);
    expect(mail.text).toContain('Pruning decisions waiting: 2');
  });

  it('escapes page paths and titles in the HTML part', () => {
    const mail = buildDigest({
      ...base,
      docSetName: '<script>x</script>',
      changes: [
        { label: 'Orphan pages', appeared: ['<img src=x onerror=alert(1)>.md'], appearedTotal: 1, disappeared: [], disappearedTotal: 0 },
      ],
    });
    expect(mail.html).not.toContain('<script>');
    expect(mail.html).not.toContain('<img');
    expect(mail.html).toContain('&lt;img src=x onerror=alert(1)&gt;.md');
  });
});
