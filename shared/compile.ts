/**
 * The one entry point from pattern text to the unit model: parse, weave,
 * thread, layout. Every caller (command line, server, chart, web) goes
 * through here, so they all see the same model and the same diagnostics.
 */
import type { Result } from './diagnostic.js';
import { parse } from '../parser/index.js';
import { compileAst, type Compiled } from './weave-model.js';

export { compileAst, type Compiled };

/** From pattern text to the model. Never throws on user input. */
export function compile(text: string): Result<Compiled> {
  const parsed = parse(text);
  return compileAst(parsed.value, parsed.diagnostics);
}
