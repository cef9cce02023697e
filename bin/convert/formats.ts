/**
 * The outputs `convert` can write, kept in a module of their own so the
 * argument parser can name them without loading the converter.
 */
export type OutputFormat = 'svg' | 'png' | 'md' | 'json';
export const OUTPUT_FORMATS: readonly OutputFormat[] = ['svg', 'png', 'md', 'json'];
/** PNG is opt-in: rasterising costs some twenty times what all the text outputs together do. */
export const DEFAULT_OUTPUT_FORMATS: readonly OutputFormat[] = ['svg', 'md', 'json'];
