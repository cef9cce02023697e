/**
 * The kit sheet: what a shop or a student packs before starting. It reads
 * the tally (never recounts) and adds the tool suggestion for the bead size
 * and the small-parts caution, so the sheet and `fourfold tally` agree.
 */
import { SMALL_PARTS_CAUTION } from './caution.js';
import { colorName } from './color-name.js';
import { escapeHtml, htmlPage, md as mdCell, swatchHtml } from './steps-render.js';
import type { Model } from './model.js';
import { MM_PER_INCH, type Tally } from './tally.js';

export interface KitOptions {
  packGrams?: number;
  workingLengthMm: number;
  tailMm: number;
}

/**
 * Needle and thread sizes that beaders commonly pair with each bead size.
 * Common practice, from memory: no single published table; a beader who
 * passes through some beads many times may want the finer choice.
 */
const TOOLS: Record<string, { needle: string; thread: string }> = {
  '15/0': {
    needle: 'size 12 or 13 beading needle',
    thread: 'fine nylon beading thread (size 00 or A) or 4 lb braided line',
  },
  '11/0': { needle: 'size 10 or 12 beading needle', thread: 'nylon beading thread size B or D, or 6 lb braided line' },
  '8/0': { needle: 'size 10 beading needle', thread: 'nylon beading thread size D, or 6 to 8 lb braided line' },
  '6/0': {
    needle: 'size 10 beading needle or a big-eye needle',
    thread: 'nylon beading thread size D or F, or 8 to 10 lb braided line',
  },
};

export function toolSuggestion(size: string): { needle: string; thread: string } | null {
  return TOOLS[size] ?? null;
}

const cm = (mm: number): string => `${Math.round(mm / 10)} cm`;
const inch = (mm: number): string => (mm / MM_PER_INCH).toFixed(2);

function buyWords(buyGrams: number, packGrams?: number): string {
  if (packGrams === undefined) return `${buyGrams} g`;
  const packs = Math.round(buyGrams / packGrams);
  return `${packs} x ${packGrams} g pack${packs === 1 ? '' : 's'} (${buyGrams} g)`;
}

interface KitContent {
  title: string;
  about: string[];
  colors: { key: string; name: string; hex: string; count: string; grams: string; buy: string }[];
  thread: string[];
  tools: string[];
  caution: string;
}

function kitContent(model: Model, t: Tally, o: KitOptions): KitContent {
  const size = model.header.beads.size;
  const tools = toolSuggestion(size);
  const spare = Math.round(t.spare * 100);
  return {
    title: `Kit: ${t.title}`,
    about: [
      ...(model.header.designer ? [`Design by ${model.header.designer}.`] : []),
      `${size} ${model.header.beads.shape} seed beads; ${t.beads} beads in all, ${t.units} units.`,
      `Finished size about ${t.size.widthMm} x ${t.size.heightMm} mm (${inch(t.size.widthMm)} x ${inch(t.size.heightMm)} in).`,
      `Buy amounts include a ${spare}% spare for misshapen beads${o.packGrams ? `, in whole packs of ${o.packGrams} g` : ''}.`,
    ],
    // A colour the pattern never uses is a palette slip (the engine warns); nothing to buy.
    colors: t.colors
      .filter((c) => c.count > 0)
      .map((c) => ({
        key: c.key,
        name: colorName(c),
        hex: c.hex,
        count: String(c.count),
        grams: `${c.grams.low.toFixed(2)}-${c.grams.high.toFixed(2)} g`,
        buy: buyWords(c.buyGrams, o.packGrams),
      })),
    thread: [
      `${cm(t.thread.mm)} of thread in all, as ${t.thread.threads} thread${t.thread.threads === 1 ? '' : 's'} ` +
        `of ${cm(o.workingLengthMm)}, each with a ${cm(o.tailMm)} tail at the start and at the end.`,
      ...(model.header.thread ? [`The designer suggests: ${model.header.thread}.`] : []),
    ],
    tools: tools
      ? [
          `Needle: ${tools.needle}.`,
          `Thread: ${tools.thread}.`,
          'These are common choices for this bead size, not a rule.',
        ]
      : [`No needle or thread suggestion is known for ${size} beads.`],
    caution: SMALL_PARTS_CAUTION,
  };
}

const bullets = (lines: string[]): string[] => lines.map((l) => `- ${mdCell(l)}`);

export function renderKitMarkdown(model: Model, t: Tally, o: KitOptions): string {
  const k = kitContent(model, t, o);
  const out = [`# ${mdCell(k.title)}`, '', ...bullets(k.about), '', '## Beads', ''];
  out.push('| key | colour | name | count | weight | buy |', '|---|---|---|---:|---:|---:|');
  for (const c of k.colors)
    out.push(`| ${c.key} | ${c.hex} | ${mdCell(c.name)} | ${c.count} | ${c.grams} | ${c.buy} |`);
  out.push('', '## Thread', '', ...bullets(k.thread), '', '## Needle and thread size', '', ...bullets(k.tools));
  out.push('', '## Caution', '', `**${mdCell(k.caution)}**`, '');
  return out.join('\n');
}

export function renderKitHtml(model: Model, t: Tally, o: KitOptions): string {
  const k = kitContent(model, t, o);
  const e = escapeHtml;
  const p = (lines: string[]): string[] => lines.map((l) => `<p>${e(l)}</p>`);
  const body = [`<h1>${e(k.title)}</h1>`, ...p(k.about), '<h2>Beads</h2>', '<table>'];
  body.push('<tr><th>key</th><th>colour</th><th>name</th><th>count</th><th>weight</th><th>buy</th></tr>');
  for (const c of k.colors) {
    body.push(
      `<tr><td>${e(c.key)}</td><td>${swatchHtml(c.hex)}${e(c.hex)}</td><td>${e(c.name)}</td>` +
        `<td>${e(c.count)}</td><td>${e(c.grams)}</td><td>${e(c.buy)}</td></tr>`,
    );
  }
  body.push('</table>', '<h2>Thread</h2>', ...p(k.thread), '<h2>Needle and thread size</h2>', ...p(k.tools));
  body.push('<h2>Caution</h2>', `<p class="caution"><strong>${e(k.caution)}</strong></p>`);
  return htmlPage(k.title, body);
}
