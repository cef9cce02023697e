import { describe, expect, it, vi } from 'vitest';
import { main } from '../../bin/dispatch.js';
import { fakeIO } from './fake-io.js';

// A command that fails inside stands for any bug a user could meet.
vi.mock('../../bin/commands/model.js', () => ({
  run: async () => {
    throw new TypeError("Cannot read properties of undefined (reading 'units')");
  },
}));

describe('an internal error', () => {
  it('is one short message and exit 2, never a stack trace', async () => {
    const io = fakeIO();
    expect(await main(['model', 'a.ffp'], io)).toBe(2);
    expect(io.err()).toBe(
      "fourfold: internal error: Cannot read properties of undefined (reading 'units')\n" +
        'This is a bug in fourfold; please report it (FOURFOLD_DEBUG=1 shows the details).\n',
    );
    expect(io.out()).toBe('');
  });

  it('shows the stack with FOURFOLD_DEBUG=1', async () => {
    const io = fakeIO({ env: { FOURFOLD_DEBUG: '1' } });
    expect(await main(['model', 'a.ffp'], io)).toBe(2);
    expect(io.err()).toMatch(/^TypeError: Cannot read properties[^\n]*\n\s+at /);
  });
});
