/** How many worker threads a batch starts: each must have enough work to pay for its start. */
import { describe, expect, test } from 'vitest';
import { PATTERN_BYTES_PER_WORKER, PNG_FILES_PER_WORKER, plannedWorkers } from '../../bin/convert/index.js';
import type { OutputFormat } from '../../bin/convert/formats.js';

const batch = (count: number, formats: OutputFormat[] = ['svg', 'md', 'json']) =>
  Array.from({ length: count }, (_, i) => ({ file: `p${i}.ffp`, formats }));

describe('plannedWorkers', () => {
  test('text outputs: one worker for each PATTERN_BYTES_PER_WORKER bytes of pattern text', () => {
    const size = (bytes: number) => () => bytes;
    // 1,000 small patterns of 220 bytes: one lane is as fast as two on two cores, so no worker.
    expect(plannedWorkers(batch(1000), 2, size(220))).toBe(0);
    expect(plannedWorkers(batch(1000), 2, size(PATTERN_BYTES_PER_WORKER / 1000))).toBe(1);
    expect(plannedWorkers(batch(1000), 8, size((3.5 * PATTERN_BYTES_PER_WORKER) / 1000))).toBe(3);
    // Never more than the lanes but this thread's, nor than the files but one.
    expect(plannedWorkers(batch(1000), 2, size(PATTERN_BYTES_PER_WORKER))).toBe(1);
    expect(plannedWorkers(batch(3), 8, size(PATTERN_BYTES_PER_WORKER))).toBe(2);
    expect(plannedWorkers(batch(1), 8, size(10 * PATTERN_BYTES_PER_WORKER))).toBe(0);
    expect(plannedWorkers(batch(1000), 1, size(PATTERN_BYTES_PER_WORKER))).toBe(0);
  });

  test('sizes are read only until every possible worker has its share', () => {
    const read: string[] = [];
    const sizeOf = (file: string) => (read.push(file), PATTERN_BYTES_PER_WORKER);
    expect(plannedWorkers(batch(1000), 3, sizeOf)).toBe(2);
    expect(read).toEqual(['p0.ffp', 'p1.ffp']);
  });

  test('with PNG: one worker for each PNG_FILES_PER_WORKER files, whatever their size', () => {
    const tiny = () => 1;
    expect(plannedWorkers(batch(PNG_FILES_PER_WORKER - 1, ['svg', 'png']), 2, tiny)).toBe(0);
    expect(plannedWorkers(batch(PNG_FILES_PER_WORKER, ['png']), 2, tiny)).toBe(1);
    expect(plannedWorkers(batch(3 * PNG_FILES_PER_WORKER, ['png', 'md']), 8, tiny)).toBe(3);
  });
});
