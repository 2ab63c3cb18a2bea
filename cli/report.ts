/**
 * `kern report FILE --out report.html [--pdf out.pdf] [--units U] [--cut y=VALUE|x=VALUE] [--paper a4|letter] [--variant NAME]`
 * Writes the self-contained HTML report and, with --pdf, prints it to PDF through headless
 * Chromium (playwright-core). A document with proposals gets the cutout check of one of them after
 * the baseline: --variant NAME, else the document's active proposal, else its first. Exit codes: 0 done (an empty or zero-area section gives a report that
 * says so), 2 bad input or Chromium missing, 1 internal error.
 */
import { existsSync, writeFileSync } from 'node:fs';
import { evaluateDocument, formatShapeIssue } from '../src';
import { renderReportHtml } from '../src/report';
import { loadSectionFile } from './dxf-input';
import { reportTorsion, reportTorsionRequest } from './torsion';

const USAGE = 'usage: kern report FILE [--out report.html] [--pdf out.pdf] [--units mm|cm|m|in|ft] [--cut y=VALUE|x=VALUE] [--paper a4|letter] [--variant NAME] [--torsion [--density coarse|normal|fine] [--poisson NU]]';

export const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
];

export function chromiumPath(): string {
  return process.env.KERN_CHROMIUM || '/usr/bin/chromium';
}

export const CHROMIUM_MISSING = (path: string) =>
  `kern report: Chromium was not found at ${path}, so no PDF was written.\n` +
  `  Install it with:  apt-get install -y chromium\n` +
  `  or point KERN_CHROMIUM at a Chromium or Chrome executable.`;

const VALUED = ['out', 'pdf', 'units', 'cut', 'paper', 'variant', 'density', 'poisson'];

function parse(args: string[]): { file?: string; flags: Map<string, string> } | string {
  const flags = new Map<string, string>();
  let file: string | undefined;
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (a.startsWith('--')) {
      const eq = a.indexOf('=');
      const name = eq > 0 ? a.slice(2, eq) : a.slice(2);
      if (name === 'torsion' && eq < 0) {
        flags.set(name, '');
        continue;
      }
      if (!VALUED.includes(name)) return `unknown option --${name}`;
      if (eq > 0) flags.set(name, a.slice(eq + 1));
      else if (i + 1 < args.length) flags.set(name, args[++i]);
      else return `--${name} needs a value`;
    } else if (file === undefined) file = a;
    else return `unexpected argument "${a}"`;
  }
  return { file, flags };
}

function parseCut(s: string): { axis: 'x' | 'y'; at: number } | null {
  const m = /^\s*([xy])\s*=\s*(.+)$/.exec(s);
  if (!m || m[2].trim() === '') return null;
  const at = Number(m[2]);
  return Number.isFinite(at) ? { axis: m[1] as 'x' | 'y', at } : null;
}

/** Print HTML to PDF with headless Chromium; returns an error message, or null when written. */
export async function printPdf(html: string, out: string, paper: 'A4' | 'Letter'): Promise<string | null> {
  const { chromium } = await import('playwright-core');
  const browser = await chromium.launch({ executablePath: chromiumPath(), args: CHROMIUM_ARGS, headless: true });
  try {
    const page = await browser.newPage();
    // No network: the report is self-contained; refuse any request it might still make.
    await page.route('**/*', (route) => route.abort());
    await page.setContent(html, { waitUntil: 'load' });
    await page.emulateMedia({ media: 'print' });
    await page.pdf({ path: out, format: paper, printBackground: true, preferCSSPageSize: true });
    return null;
  } finally {
    await browser.close();
  }
}

export async function reportCommand(args: string[]): Promise<number> {
  const err = (s: string) => process.stderr.write(s.endsWith('\n') ? s : s + '\n');
  const p = parse(args);
  if (typeof p === 'string') {
    err(`kern report: ${p}\n${USAGE}`);
    return 2;
  }
  const { file, flags } = p;
  const out = flags.get('out'), pdf = flags.get('pdf');
  if (!file) {
    err(`kern report: missing FILE\n${USAGE}`);
    return 2;
  }
  if (!out && !pdf) {
    err(`kern report: give --out report.html and/or --pdf report.pdf\n${USAGE}`);
    return 2;
  }
  const paperFlag = (flags.get('paper') ?? 'a4').toLowerCase();
  if (paperFlag !== 'a4' && paperFlag !== 'letter') {
    err(`kern report: --paper must be a4 or letter, got "${flags.get('paper')}"`);
    return 2;
  }
  let cut: { axis: 'x' | 'y'; at: number } | null = null;
  if (flags.has('cut')) {
    cut = parseCut(flags.get('cut')!);
    if (!cut) {
      err(`kern report: --cut needs y=VALUE or x=VALUE with a finite number, got "${flags.get('cut')}"`);
      return 2;
    }
  }
  const torsion = reportTorsionRequest(flags);
  if (typeof torsion === 'string') {
    err(`kern report: ${torsion}`);
    return 2;
  }
  if (pdf && !existsSync(chromiumPath())) {
    err(CHROMIUM_MISSING(chromiumPath()));
    return 2;
  }

  const loaded = loadSectionFile(file, flags.get('units'));
  if (!loaded.ok) {
    err(`${file}: the section cannot be read:`);
    for (const m of loaded.messages) err(`  ${m}`);
    return 2;
  }
  for (const w of loaded.warnings) err(`warning: ${w}`);
  const variant = flags.get('variant');
  if (variant !== undefined && !loaded.doc.variants?.some((v) => v.name === variant)) {
    const names = (loaded.doc.variants ?? []).map((v) => `"${v.name}"`).join(', ');
    err(`kern report: ${file} has no proposal named "${variant}"; ${names ? `it has ${names}` : 'it has no proposals'}`);
    return 2;
  }
  const evaluation = evaluateDocument(loaded.doc);
  for (const w of evaluation.warnings) err(`warning: ${formatShapeIssue(w, loaded.doc.shapes)}`);
  // An empty or degenerate section still gets its report: a page that says so, with no figure.
  if (!evaluation.props && evaluation.lines.length > 0) err(`note: ${file}: line elements only; the report gives the line groups, and says that the area properties are absent`);
  else if (!evaluation.props) err(`warning: ${file}: ${(evaluation.message ?? 'the section has no area').replace(/\.$/, '')}; the report says so and has no figure`);
  const html = renderReportHtml({ doc: loaded.doc, evaluation, cut, variant, generated: new Date().toISOString().replace(/\.\d+Z$/, 'Z'), torsion: reportTorsion(loaded.doc, evaluation, torsion) });
  try {
    if (out) writeFileSync(out, html);
  } catch (e) {
    err(`kern report: cannot write ${out}: ${(e as NodeJS.ErrnoException).code ?? String(e)}`);
    return 2;
  }
  if (pdf) {
    try {
      await printPdf(html, pdf, paperFlag === 'letter' ? 'Letter' : 'A4');
    } catch (e) {
      const msg = e instanceof Error ? e.message : String(e);
      if (/ENOENT|Failed to launch|executable doesn't exist/i.test(msg)) {
        err(CHROMIUM_MISSING(chromiumPath()));
        err(`  (${msg.split('\n')[0]})`);
        return 2;
      }
      err(`kern report: printing to PDF failed: ${msg.split('\n')[0]}`);
      return 1;
    }
  }
  return 0;
}
