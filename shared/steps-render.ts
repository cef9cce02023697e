/**
 * Text, Markdown and HTML layouts of the steps document. The sentences are
 * made once (`unitSentences`), so the three formats always say the same
 * thing; each renderer only decides how a heading, a list and a line look.
 */
import type { BeadRef, StepMove, StepRow, StepUnit, StepsDoc } from './steps.js';

const label = (b: Pick<BeadRef, 'key' | 'name'>): string => (b.name ? `${b.key} ${b.name}` : b.key);

/** "B deep teal x2, C honey": runs of one colour said once, in pick-up order. */
function pickupPhrase(beads: readonly BeadRef[]): string {
  const runs: { bead: BeadRef; n: number }[] = [];
  for (const bead of beads) {
    const last = runs[runs.length - 1];
    if (last && last.bead.key === bead.key) last.n++;
    else runs.push({ bead, n: 1 });
  }
  return runs.map((r) => (r.n > 1 ? `${label(r.bead)} x${r.n}` : label(r.bead))).join(', ');
}

const passPhrase = (beads: readonly BeadRef[]): string =>
  beads.map((b) => `the ${b.where} (${label(b)})`).join(', then ');

const plural = (n: number, one: string, many = `${one}s`): string => `${n} ${n === 1 ? one : many}`;

function moveSentence(move: StepMove, isLast: boolean): string {
  if (move.kind === 'pickup') return `Pick up ${pickupPhrase(move.beads)}.`;
  return `Pass through ${passPhrase(move.beads)}${isLast ? ' to close the unit' : ''}.`;
}

const MARK_WORDS: Record<StepUnit['mark'], string> = { '': '', '*': 'fresh ring', '+': 'increase' };

export function unitHeading(step: StepUnit): string {
  const extras = [MARK_WORDS[step.mark], step.closes ? 'joins up with unit 1' : '', step.cue].filter(Boolean);
  return `Unit ${step.number}${extras.length ? ` (${extras.join('; ')})` : ''}`;
}

/** The sentences for one unit, in the order the beader does them. */
export function unitSentences(step: StepUnit, word: StepRow['word']): string[] {
  const lines = step.round.map((m, i) => moveSentence(m, i === step.round.length - 1));
  if (step.moveOn.length) lines.push(`To move on, pass through ${passPhrase(step.moveOn)}.`);
  lines.push(`The ${word} now shows ${plural(step.sideBeads, 'side bead')}.`);
  return lines;
}

/** ", leaving 1 bead of row 7 uncovered at the start and 1 at the end", or '' where the row covers them all. */
function uncoveredPhrase(row: StepRow): string {
  const u = row.uncovered;
  if (!u) return '';
  const counts = (
    [
      [u.start, 'at the start'],
      [u.end, 'at the end'],
      [u.along, 'along the way'],
    ] as const
  ).filter(([n]) => n > 0);
  // The first count carries the noun, the others only their number.
  const phrases = counts.map(([n, where], i) =>
    i === 0 ? `${plural(n, 'bead')} of ${row.word} ${row.row - 1} uncovered ${where}` : `${n} ${where}`,
  );
  const last = phrases.pop()!;
  return `, leaving ${phrases.length ? `${phrases.join(', ')} and ${last}` : last}`;
}

export function rowHeading(row: StepRow): string {
  const name = row.word === 'round' ? 'Round' : 'Row';
  return `${name} ${row.row}: ${plural(row.units, 'unit')}, ${plural(row.beads, 'new bead')}, ${row.direction}${uncoveredPhrase(row)}`;
}

function byline(doc: StepsDoc): string {
  return [doc.designer ? `by ${doc.designer}` : '', `${doc.beads} beads`, `${doc.layout} layout`]
    .filter(Boolean)
    .join(' - ');
}

const colorLine = (c: StepsDoc['colors'][number]): string => `${label(c)} (${c.hex})`;
const glossLine = (g: StepsDoc['glossary'][number]): string => `${g.term}: ${g.meaning}`;

export function renderStepsText(doc: StepsDoc): string {
  const out: string[] = [doc.title, byline(doc), '', 'Words used:'];
  out.push(...doc.glossary.map((g) => `  ${glossLine(g)}`), '', 'Colours:');
  out.push(...doc.colors.map((c) => `  ${colorLine(c)}`));
  if (doc.notes.length) out.push('', 'Notes:', ...doc.notes.map((n) => `  ${n}`));
  out.push('', 'Starting:', `  ${doc.start}`);
  for (const row of doc.rows) {
    out.push('', rowHeading(row), ...row.notes.map((n) => `  Note: ${n}`));
    for (const step of row.steps) {
      out.push(`  ${unitHeading(step)}`, ...unitSentences(step, row.word).map((s) => `    ${s}`));
    }
  }
  out.push('', 'Finishing:', `  ${doc.finish}`);
  return `${out.join('\n')}\n`;
}

/**
 * Markdown punctuation that could turn a name or note into markup. Line-start
 * markers (`-`, `1.`) need no escape: every text line here starts after a
 * marker of ours; `#` only matters after a space (a heading's closing run).
 */
export const md = (s: string): string => s.replace(/[\\`*_[\]<>|~&]/g, '\\$&').replace(/(^|\s)#/g, '$1\\#');

export function renderStepsMarkdown(doc: StepsDoc): string {
  const out: string[] = [`# ${md(doc.title)}`, '', md(byline(doc)), '', '## Words used', ''];
  out.push(...doc.glossary.map((g) => `- **${md(g.term)}**: ${md(g.meaning)}`), '', '## Colours', '');
  out.push(...doc.colors.map((c) => `- ${md(colorLine(c))}`));
  if (doc.notes.length) out.push('', '## Notes', '', ...doc.notes.map((n) => `- ${md(n)}`));
  out.push('', '## Starting', '', md(doc.start));
  for (const row of doc.rows) {
    out.push('', `## ${md(rowHeading(row))}`, '');
    if (row.notes.length) out.push(...row.notes.map((n) => `> ${md(n)}`), '');
    for (const step of row.steps) {
      out.push(`- **${md(unitHeading(step))}**`, ...unitSentences(step, row.word).map((s) => `  - ${md(s)}`));
    }
  }
  out.push('', '## Finishing', '', md(doc.finish));
  return `${out.join('\n')}\n`;
}

export const escapeHtml = (s: string): string =>
  s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');

/** Where hex comes from a palette it is already `#rrggbb`; anything else is not put in a style. */
const safeHex = (hex: string): string => (/^#[0-9a-f]{6}$/i.test(hex) ? hex : '#000000');

export function swatchHtml(hex: string): string {
  return `<span class="swatch" style="background:${safeHex(hex)}" aria-hidden="true"></span>`;
}

/** A whole XHTML-compatible page (also valid HTML5), so it can be saved and opened as it is. */
export function htmlPage(title: string, body: string[]): string {
  return [
    '<!DOCTYPE html>',
    '<html lang="en" xmlns="http://www.w3.org/1999/xhtml">',
    '<head>',
    '<meta charset="utf-8" />',
    `<title>${escapeHtml(title)}</title>`,
    '<style>body{font-family:system-ui,sans-serif;max-width:46em;margin:2em auto;line-height:1.45}' +
      '.swatch{display:inline-block;width:1em;height:1em;border:1px solid #555;vertical-align:middle;margin-right:.3em}' +
      'table{border-collapse:collapse}td,th{padding:.2em .6em;border-bottom:1px solid #ccc;text-align:left}</style>',
    '</head>',
    '<body>',
    ...body,
    '</body>',
    '</html>',
    '',
  ].join('\n');
}

export function renderStepsHtml(doc: StepsDoc): string {
  const e = escapeHtml;
  const body: string[] = [`<h1>${e(doc.title)}</h1>`, `<p>${e(byline(doc))}</p>`, '<h2>Words used</h2>', '<dl>'];
  for (const g of doc.glossary) body.push(`<dt>${e(g.term)}</dt><dd>${e(g.meaning)}</dd>`);
  body.push('</dl>', '<h2>Colours</h2>', '<ul>');
  for (const c of doc.colors) body.push(`<li>${swatchHtml(c.hex)}${e(colorLine(c))}</li>`);
  body.push('</ul>');
  if (doc.notes.length) body.push('<h2>Notes</h2>', '<ul>', ...doc.notes.map((n) => `<li>${e(n)}</li>`), '</ul>');
  body.push('<h2>Starting</h2>', `<p>${e(doc.start)}</p>`);
  for (const row of doc.rows) {
    body.push(`<section id="row-${row.row}">`, `<h2>${e(rowHeading(row))}</h2>`);
    body.push(...row.notes.map((n) => `<p class="note">${e(n)}</p>`), '<ol>');
    for (const step of row.steps) {
      const items = unitSentences(step, row.word)
        .map((s) => `<li>${e(s)}</li>`)
        .join('');
      body.push(`<li value="${step.number}"><strong>${e(unitHeading(step))}</strong><ul>${items}</ul></li>`);
    }
    body.push('</ol>', '</section>');
  }
  body.push('<h2>Finishing</h2>', `<p>${e(doc.finish)}</p>`);
  return htmlPage(doc.title, body);
}
