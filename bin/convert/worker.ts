/** The worker thread's task for piscina: one file per call. */
export { convertOne as default } from './convert-one.js';
