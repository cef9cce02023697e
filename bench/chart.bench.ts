/**
 * Scene + SVG text for a generated round of about 5,000 beads, against a
 * bare string concatenation drawing the same number of capsules with their
 * letters. Goal: at most 3x. The font subset is left out of both: it is
 * cached per set of characters and would only hide the emitter's cost. Both
 * sides end with the bytes a write would take: the emitter writes UTF-8
 * bytes (what the CLI, batch conversion and the server write or send), the
 * baseline's string is measured as UTF-8, which reads it whole (a string
 * built with `+=` is a rope until something does).
 */
import { performance } from 'node:perf_hooks';
import { buildScene } from '../shared/chart/scene.js';
import { sceneToSvgBytes } from '../shared/chart/svg-text.js';
import { compile } from '../shared/compile.js';
import type { Model } from '../shared/model.js';
import type { Bench } from './harness.js';

const UNITS = 50;

/** A round of `rounds` rounds of UNITS units each, two colours in stripes: about 2 * UNITS beads a round. */
export function roundPattern(rounds: number): string {
  const lines = [
    'title: Bench Round',
    'designer: Sable Quint',
    'layout: round',
    'colors:',
    '  A #2E6F8E teal',
    '  B #F4F1EA chalk',
  ];
  lines.push(`round 1: AAAA (ABA)x${UNITS - 2} AB`);
  for (let r = 2; r <= rounds; r++)
    lines.push(`round ${r}: ${r % 2 ? 'ABA' : 'BAB'} (${r % 2 ? 'AB' : 'BA'})x${UNITS - 2} A`);
  return `${lines.join('\n')}\n`;
}

/** What the emitter competes with: one rounded rect and one letter per bead, numbers fixed to 2 decimals. */
function bareCapsules(model: Model): string {
  let s = '<svg xmlns="http://www.w3.org/2000/svg">';
  for (const b of model.beads) {
    const x = (b.x * 8).toFixed(2);
    const y = (-b.y * 8).toFixed(2);
    s += `<rect x="${x}" y="${y}" width="${(b.length * 8).toFixed(2)}" height="2.88" rx="1.44" transform="rotate(${(-b.angle).toFixed(2)} ${x} ${y})" fill="#2e6f8e" stroke="#333333"/>`;
    s += `<text x="${x}" y="${y}" font-size="2.3" fill="#ffffff">${b.color}</text>`;
  }
  return `${s}</svg>`;
}

/**
 * Medians of the wall times of `a` and `b`, timed in turns after `warmup`
 * turns: on a shared machine the load changes from second to second, and
 * taking turns lets each change fall on both sides alike.
 */
async function medianPairMs(
  a: () => unknown,
  b: () => unknown,
  runs: number,
  warmup: number,
): Promise<[number, number]> {
  const ta: number[] = [];
  const tb: number[] = [];
  for (let i = 0; i < warmup + runs; i++) {
    const t0 = performance.now();
    await a();
    const t1 = performance.now();
    await b();
    const t2 = performance.now();
    if (i < warmup) continue;
    ta.push(t1 - t0);
    tb.push(t2 - t1);
  }
  const median = (t: number[]): number => t.sort((x, y) => x - y)[Math.floor(t.length / 2)]!;
  return [median(ta), median(tb)];
}

const bench: Bench = {
  name: 'chart',
  async run() {
    const compiled = compile(roundPattern(50));
    const model = compiled.value.model;
    let size = 0;
    const [emit, bare] = await medianPairMs(
      () => (size = sceneToSvgBytes(buildScene(model).value).length),
      () => Buffer.byteLength(bareCapsules(model)),
      31,
      20,
    );
    if (size === 0) throw new Error('the chart came out empty');
    // The outer round's thread, whose hundreds of pass numbers each keep clear of 5,000 key letters: what the
    // viewer builds at every step of a tester's walk through that round.
    const outer = model.rows.length;
    const [withThread, without] = await medianPairMs(
      () => buildScene(model, { thread: outer }),
      () => buildScene(model),
      11,
      5,
    );
    return [
      {
        name: `scene + SVG text of a ${model.beads.length}-bead round vs bare string concatenation of as many capsules`,
        value: emit,
        baseline: bare,
        unit: 'ms',
        goal: { atMost: 3 },
      },
      {
        name: `scene of the same round with the thread of round ${outer} vs without`,
        value: withThread,
        baseline: without,
        unit: 'ms',
      },
    ];
  },
};

export default bench;
