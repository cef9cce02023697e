/**
 * What the preview server sends on every save (and at GET /api/preview/state),
 * read by the web app's /preview page. Types only, so the browser build can
 * import it without pulling in anything from Node.
 */
import type { Diagnostic } from '../../shared/diagnostic.js';
import type { Model } from '../../shared/model.js';

export interface PreviewState {
  file: string;
  /** Counts up with every read of the file, so the page can tell a new state from a repeat. */
  revision: number;
  source: string;
  diagnostics: Diagnostic[];
  /** The model of the last save without errors; null until there is one. */
  model: Model | null;
  /** True when `model` is from an earlier save than `source`. */
  stale: boolean;
}
