/**
 * The checker's part of the report: the revision history, the notes and the "checked by / date"
 * block, read from the document fields of format version 2 (`revisions`, `notes`, `checked`).
 * They are read defensively from the plain document object, so a version-1 document (none of
 * them) or a malformed entry never breaks the report: text fields accept strings and numbers,
 * anything else reads as empty. When nothing is recorded the tables are printed with blank rows,
 * to be filled in and signed by hand.
 */
import { escapeHtml } from './escape';

export interface RevisionEntry {
  revision: string;
  date: string;
  description: string;
  by: string;
}

export interface CheckerFields {
  revisions: RevisionEntry[];
  notes: string;
  checked: { by: string; date: string } | null;
}

const text = (v: unknown): string => (typeof v === 'string' ? v : typeof v === 'number' && Number.isFinite(v) ? String(v) : '');
const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** The checker fields of a document object (any version), with every malformed part left empty. */
export function checkerFields(doc: unknown): CheckerFields {
  const d = isRecord(doc) ? doc : {};
  const revisions = Array.isArray(d.revisions)
    ? d.revisions.filter(isRecord).map((r) => ({ revision: text(r.revision), date: text(r.date), description: text(r.description), by: text(r.by) }))
    : [];
  const checked = isRecord(d.checked) ? { by: text(d.checked.by), date: text(d.checked.date) } : null;
  return { revisions, notes: text(d.notes), checked };
}

/** Blank rows printed under a short revision history, for hand entries. */
const BLANK_ROWS = 1;

/** The revision history, notes and sign-off block (HTML). */
export function renderCheckerBlock(fields: CheckerFields): string {
  const rows = fields.revisions.map(
    (r) =>
      `<tr data-revision><td>${escapeHtml(r.revision)}</td><td>${escapeHtml(r.date)}</td><td>${escapeHtml(r.description)}</td><td>${escapeHtml(r.by)}</td></tr>`,
  );
  for (let i = fields.revisions.length; i < BLANK_ROWS; i++) rows.push(`<tr class="blank"><td></td><td></td><td></td><td></td></tr>`);
  const notes = `<div class="notes${fields.notes.trim() ? '' : ' empty'}" data-field="notes"><span class="notes-label">Notes</span>${escapeHtml(fields.notes)}</div>`;
  const c = fields.checked;
  return (
    `<section class="block checker"><h2>Revisions, notes and check</h2>` +
    `<table class="revisions"><thead><tr><th>Revision</th><th>Date</th><th>Description</th><th>By</th></tr></thead><tbody>${rows.join('')}</tbody></table>` +
    `<div class="checker-cols"><div>${notes}</div>` +
    `<table class="signoff"><tbody>` +
    `<tr><td><span class="label">Checked by</span><span class="value" data-field="checked-by">${escapeHtml(c?.by ?? '')}</span></td>` +
    `<td><span class="label">Date</span><span class="value" data-field="checked-date">${escapeHtml(c?.date ?? '')}</span></td></tr>` +
    `<tr><td colspan="2"><span class="label">Signature</span><span class="value"></span></td></tr>` +
    `</tbody></table></div></section>`
  );
}
