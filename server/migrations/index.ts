/**
 * The migrations in order. Listed by hand rather than globbed so the same list
 * runs from the TypeScript sources (tests) and from dist/ (npm start).
 */
import * as initial from './0001-initial.js';

export const migrations = [{ name: '0001-initial', ...initial }];
