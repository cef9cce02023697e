/** The worker thread's task for piscina: one pattern's analysis per call. */
export { analyseNow as default } from './engine.js';
