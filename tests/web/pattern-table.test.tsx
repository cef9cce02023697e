import { describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { Pager, PatternTable, sharingText } from '../../web/src/components/pattern-table.js';
import { defaultListParams } from '../../web/src/queries/patterns.js';
import type { PatternSummary } from '../../web/src/api/types.js';
import { renderWithApp } from './helpers.js';

const summary = (over: Partial<PatternSummary>): PatternSummary => ({
  id: 1,
  title: 'Harbour Band',
  layout: 'flat',
  rows: 4,
  units: 12,
  beads: 43,
  colors: [
    { key: 'A', hex: '#f4f1ea', name: 'chalk' },
    { key: 'B', hex: '#2e6f8e', name: 'deep teal' },
  ],
  version: 1,
  errors: 0,
  warnings: 0,
  owner: { id: 2, name: 'Ines Marlow' },
  sharing: { links: 0, testers: 0 },
  createdAt: '2026-11-01T10:00:00.000Z',
  updatedAt: '2026-11-02T10:00:00.000Z',
  ...over,
});

describe('library table', () => {
  it('shows one row per pattern with its counts, swatches and sharing, and marks patterns with errors', () => {
    const items = [
      summary({}),
      summary({
        id: 2,
        title: 'Broken Tube',
        layout: 'tube',
        beads: null,
        units: null,
        errors: 2,
        sharing: { links: 1, testers: 2 },
      }),
    ];
    renderWithApp(<PatternTable items={items} params={defaultListParams} onChange={() => {}} />);
    const rows = screen.getAllByRole('row').slice(1);
    expect(rows).toHaveLength(2);
    const first = within(rows[0]!);
    expect(first.getByRole('link', { name: 'Harbour Band' }).getAttribute('href')).toBe('/patterns/1');
    expect(first.getByText('43')).toBeTruthy();
    expect(first.getByRole('list', { name: 'Colours: chalk, deep teal' }).children).toHaveLength(2);
    expect(first.getByText('Private')).toBeTruthy();
    const second = within(rows[1]!);
    expect(second.getByText('2 errors')).toBeTruthy();
    expect(second.getByText('1 link, 2 testers')).toBeTruthy();
    // A pattern the engine could not count shows a dash, not a zero.
    expect(second.getAllByText('–')).toHaveLength(2);
  });

  it('asks the server for a sort: a new column first, then the other direction, back to page 1', async () => {
    const onChange = vi.fn();
    const params = { ...defaultListParams, page: 3 };
    renderWithApp(<PatternTable items={[summary({})]} params={params} onChange={onChange} />);
    const updated = screen.getByRole('columnheader', { name: /Updated/ });
    expect(updated.getAttribute('aria-sort')).toBe('descending');
    await userEvent.click(screen.getByRole('button', { name: /Title/ }));
    expect(onChange).toHaveBeenLastCalledWith({ ...params, sort: 'title', dir: 'asc', page: 1 });
    await userEvent.click(screen.getByRole('button', { name: /Updated/ }));
    expect(onChange).toHaveBeenLastCalledWith({ ...params, sort: 'updated', dir: 'asc', page: 1 });
  });

  it('pages within the total and disables the ends', async () => {
    const onChange = vi.fn();
    renderWithApp(<Pager total={51} params={{ ...defaultListParams, page: 1 }} onChange={onChange} />);
    expect(screen.getByText(/Page 1 of 3/)).toBeTruthy();
    expect((screen.getByRole('button', { name: 'Previous page' }) as HTMLButtonElement).disabled).toBe(true);
    await userEvent.click(screen.getByRole('button', { name: 'Next page' }));
    expect(onChange).toHaveBeenCalledWith({ ...defaultListParams, page: 2 });
  });

  it('words sharing in full', () => {
    expect(sharingText({ links: 0, testers: 1 })).toBe('1 tester');
    expect(sharingText({ links: 2, testers: 0 })).toBe('2 links');
  });
});
