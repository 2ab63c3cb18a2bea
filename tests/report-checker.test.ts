/**
 * The checker's fields in the report (src/report/checker.ts): the revision history, the notes and
 * the "checked by / date" block of format version 2, read defensively from the document object.
 * No published source applies: these are the document's own strings, printed as text.
 */
import { describe, expect, test } from 'vitest';
import { DEMO_DOCUMENT, evaluateDocument, type SectionDocument } from '../src';
import { renderReportHtml } from '../src/report';
import { checkerFields } from '../src/report/checker';

const render = (doc: SectionDocument) => renderReportHtml({ doc, evaluation: evaluateDocument(doc) });

describe('revision history, notes and sign-off', () => {
  const doc = {
    ...DEMO_DOCUMENT,
    revisions: [
      { revision: 'A', date: '2026-11-20', description: 'First issue for checking', by: 'A. Drafter' },
      { revision: 'B', date: '2026-12-02', description: 'Opening moved to mid-depth <per RFI 12>', by: 'A. Drafter' },
    ],
    notes: 'Opening edges ground smooth.\nCheck against the connection design.',
    checked: { by: 'B. Checker', date: '2026-12-03' },
  } as unknown as SectionDocument;
  const html = render(doc);

  test('every revision is a row, in order, with its four fields', () => {
    const rows = [...html.matchAll(/<tr data-revision><td>([^<]*)<\/td><td>([^<]*)<\/td><td>([^<]*)<\/td><td>([^<]*)<\/td><\/tr>/g)].map((m) => m.slice(1));
    expect(rows).toEqual([
      ['A', '2026-11-20', 'First issue for checking', 'A. Drafter'],
      ['B', '2026-12-02', 'Opening moved to mid-depth &lt;per RFI 12&gt;', 'A. Drafter'],
    ]);
  });

  test('the notes keep their lines, as text; checked by and date are filled in', () => {
    expect(html).toContain('Opening edges ground smooth.\nCheck against the connection design.');
    expect(html).toMatch(/\.notes \{[^}]*white-space: pre-wrap/);
    expect(html).toContain('data-field="checked-by">B. Checker</span>');
    expect(html).toContain('data-field="checked-date">2026-12-03</span>');
    expect(html).toContain('data-field="checker">B. Checker</span>'); // the title block agrees when its own field is blank
  });

  test('a version-1 document prints the block empty, ready to fill in by hand', () => {
    const h = render(DEMO_DOCUMENT);
    expect(h).toContain('Revisions, notes and check');
    expect(h).not.toContain('<tr data-revision>');
    expect(h).toContain('<tr class="blank">');
    expect(h).toContain('data-field="checked-by"></span>');
  });

  test('malformed fields read as empty, never break the report', () => {
    expect(checkerFields({ revisions: 'A', notes: 5, checked: [] })).toEqual({ revisions: [], notes: '5', checked: null });
    expect(checkerFields({ revisions: [null, 3, { revision: 2, date: {}, by: 'X' }] })).toEqual({
      revisions: [{ revision: '2', date: '', description: '', by: 'X' }],
      notes: '',
      checked: null,
    });
    expect(checkerFields(null)).toEqual({ revisions: [], notes: '', checked: null });
    const bad = { ...DEMO_DOCUMENT, revisions: [{ revision: '<script>x</script>' }], notes: { a: 1 } } as unknown as SectionDocument;
    const h = render(bad);
    expect(h).not.toMatch(/<script/i);
    expect(h).toContain('&lt;script&gt;x&lt;/script&gt;');
  });
});
