/**
 * Charts, tally, steps, kit and model of a stored version, through the same
 * public functions the CLI uses, so downloads match the CLI byte for byte.
 */
import type { Model } from '../shared/model.js';
import type { Tally } from '../shared/tally.js';
import { HttpError } from './errors.js';

export interface Rendered {
  type: string;
  body: string | Buffer;
}

export type ViewKind = 'chart.svg' | 'chart.png' | 'tally' | 'steps' | 'kit' | 'model';

const notAvailable = (what: string) => new HttpError(501, 'not-available', `${what} is not available on this server yet.`);

export function tallyOf(_model: Model): Tally | null {
  return null;
}

export async function renderView(kind: ViewKind, model: Model | null, _query: Record<string, unknown>): Promise<Rendered> {
  if (!model) throw new HttpError(422, 'no-model', 'This version could not be built, so there is nothing to draw or count.');
  if (kind === 'model') return { type: 'application/json; charset=utf-8', body: JSON.stringify(model) };
  throw notAvailable(kind);
}
