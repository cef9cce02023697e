import { describe, expect, it } from 'vitest';
import { useState } from 'react';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { buildSteps } from '../../shared/steps.js';
import { unitSentences } from '../../shared/steps-render.js';
import type { Model } from '../../shared/model.js';
import { RowStepper } from '../../web/src/components/row-stepper.js';
import { step, validPlace, workOrder, type StepPlace } from '../../web/src/lib/stepper.js';
import { modelOf } from './helpers.js';

const header = 'title: Stepper Strip\ncolors:\n  A #f4f1ea chalk\n  B #2e6f8e deep teal\n';
/** A flat strip of n units: the first takes 4 beads, each later one 3 (NOTATION.md section 3). */
const strip = (n: number) => `${header}row 1: BBBB${' AAB'.repeat(n - 1)}\n`;
/** Two rows of three: row 2 is worked back over row 1 (3 new beads, then 2 each). */
const panel = `${header}row 1: BBBB AAA BBB\nrow 2: AAA BB AA\n`;

function Harness({ model, start }: { model: Model; start?: StepPlace }) {
  const [place, setPlace] = useState<StepPlace>(start ?? validPlace(model, null)!);
  return <RowStepper model={model} steps={buildSteps(model)} place={place} onPlace={setPlace} />;
}

const placeText = () => screen.getByTestId('stepper-place').textContent;

describe('row stepper', () => {
  it('walks every unit of a strip once: n units, and the chart count is the closed form 3n + 1', () => {
    // Source: NOTATION.md section 8, flat strip of n units has 3n + 1 beads.
    for (const n of [1, 2, 7]) {
      const model = modelOf(strip(n));
      expect(model.beads).toHaveLength(3 * n + 1);
      expect(workOrder(model)).toHaveLength(n);
      let place = validPlace(model, null)!;
      for (let i = 1; i < n; i++) place = step(model, place, 1);
      expect(place).toEqual({ row: 1, unit: n });
      expect(step(model, place, 1)).toEqual(place);
    }
  });

  it('moves with the buttons, stays put at either end, and crosses into the next row', async () => {
    render(<Harness model={modelOf(panel)} />);
    expect(placeText()).toBe('Row 1, unit 1 of 3');
    await userEvent.click(screen.getByRole('button', { name: /Previous unit/ }));
    expect(placeText()).toBe('Row 1, unit 1 of 3');
    for (let i = 0; i < 3; i++) await userEvent.click(screen.getByRole('button', { name: /Next unit/ }));
    expect(placeText()).toBe('Row 2, unit 1 of 3');
    for (let i = 0; i < 5; i++) await userEvent.click(screen.getByRole('button', { name: /Next unit/ }));
    expect(placeText()).toBe('Row 2, unit 3 of 3');
  });

  it('follows the arrow keys on the page, but not while typing in a field', async () => {
    render(<Harness model={modelOf(panel)} />);
    await userEvent.keyboard('{ArrowRight}{ArrowRight}');
    expect(placeText()).toBe('Row 1, unit 3 of 3');
    await userEvent.keyboard('{ArrowLeft}');
    expect(placeText()).toBe('Row 1, unit 2 of 3');
    await userEvent.click(screen.getByLabelText('Jump to row'));
    await userEvent.keyboard('{ArrowRight}');
    expect(placeText()).toBe('Row 1, unit 2 of 3');
  });

  it('jumps to the first unit of a row, and refuses a row the pattern does not have', async () => {
    render(<Harness model={modelOf(panel)} />);
    const input = screen.getByLabelText('Jump to row');
    const go = screen.getByRole('button', { name: 'Go' }) as HTMLButtonElement;
    await userEvent.clear(input);
    await userEvent.type(input, '9');
    expect(go.disabled).toBe(true);
    expect(input.getAttribute('aria-invalid')).toBe('true');
    await userEvent.clear(input);
    await userEvent.type(input, '2{Enter}');
    expect(placeText()).toBe('Row 2, unit 1 of 3');
  });

  it('shows the written step of the current unit; a unit of three new beads closes through one bead', () => {
    // Common practice (NOTATION.md section 4): three new beads are followed by passing through one.
    const model = modelOf(panel);
    render(<Harness model={model} start={{ row: 1, unit: 2 }} />);
    const doc = buildSteps(model);
    const unit = doc.rows[0]!.steps[1]!;
    const items = screen.getByTestId('step-text').querySelectorAll('li');
    expect([...items].map((li) => li.textContent)).toEqual(unitSentences(unit, 'row'));
    const closing = unit.round.filter((m) => m.kind === 'pass');
    expect(closing.flatMap((m) => m.beads)).toHaveLength(1);
    expect(unit.round.filter((m) => m.kind === 'pickup').flatMap((m) => m.beads)).toHaveLength(3);
  });

  it('brings back a saved place, or the start of its row when the unit is gone in this version', () => {
    const model = modelOf(panel);
    expect(validPlace(model, { row: 2, unit: 3 })).toEqual({ row: 2, unit: 3 });
    expect(validPlace(model, { row: 2, unit: 9 })).toEqual({ row: 2, unit: 1 });
    expect(validPlace(model, { row: 7, unit: 1 })).toEqual({ row: 1, unit: 1 });
    expect(validPlace(model, { row: null, unit: null })).toEqual({ row: 1, unit: 1 });
  });
});
