/** Paper size for the printed report: one more @page rule (the report's own sets the margins). */
export type Paper = 'A4' | 'Letter';

export function withPaperSize(html: string, paper: Paper): string {
  const rule = `@page { size: ${paper === 'A4' ? 'A4' : 'letter'} portrait; }`;
  const i = html.indexOf('</style>');
  return i < 0 ? html : html.slice(0, i) + rule + html.slice(i);
}
