/**
 * The model of a pattern text, worked out in the browser with the same pure
 * engine the server and the CLI use (shared/compile.ts), so the chart, the
 * stepper and the live checks need no extra request.
 */
import { useMemo } from 'react';
import { compile } from '../../../shared/compile.js';
import { beadSize } from '../../../shared/bead-sizes.js';
import type { Model } from '../../../shared/model.js';
import { tally } from '../../../shared/tally.js';
import type { TallyJson } from '../api/types.js';

export const useCompiled = (source: string) => useMemo(() => compile(source), [source]);

/** The tally for a model, as the server would send it (default spare and thread lengths). */
export function localTally(model: Model): TallyJson {
  return tally(model, { beadsPerGram: beadSize(model.header.beads.size, model.header.beads.shape).perGram }).value;
}
