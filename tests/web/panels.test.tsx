import { useState } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { cleanup, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { FeedbackPanel } from '../../web/src/components/feedback-panel.js';
import { SharingPanel } from '../../web/src/components/sharing-panel.js';
import { countChanges } from '../../web/src/components/versions-panel.js';
import type { FeedbackNote, TallyJson } from '../../web/src/api/types.js';
import type { StepPlace } from '../../web/src/lib/stepper.js';
import { mockApi, renderWithApp } from './helpers.js';

const note = (over: Partial<FeedbackNote>): FeedbackNote => ({
  id: 1,
  version: 1,
  row: 3,
  unit: 2,
  text: 'The second bead here reads as chalk.',
  status: 'open',
  author: { id: 5, name: 'Odile Ferrant' },
  createdAt: '2026-11-03T09:00:00.000Z',
  resolvedAt: null,
  ...over,
});

describe('notes', () => {
  it('lists open notes with the version they were written on, and resolves one', async () => {
    const api = mockApi({
      'GET /api/patterns/4/feedback': {
        json: { items: [note({}), note({ id: 2, status: 'resolved', unit: null, text: 'Row 1 is fine now.' })] },
      },
      'PATCH /api/patterns/4/feedback/1': { json: note({ status: 'resolved' }) },
    });
    const onShow = vi.fn();
    renderWithApp(
      <FeedbackPanel
        patternId={4}
        version={2}
        picked={{ row: 1, unit: 1 }}
        current={{ row: 1, unit: 1 }}
        onPick={() => {}}
        canWrite={false}
        canResolve
        onShow={onShow}
      />,
    );
    await screen.findByText('Open notes (1)');
    expect(screen.getAllByText(/written on version 1/)).toHaveLength(2);
    expect(screen.getByText('Resolved notes (1)')).toBeTruthy();
    await userEvent.click(screen.getByRole('button', { name: 'row 3, unit 2' }));
    expect(onShow).toHaveBeenCalledWith({ row: 3, unit: 2 });
    await userEvent.click(screen.getByRole('button', { name: 'Resolve' }));
    await waitFor(() => expect(api.sent.some((r) => r.method === 'PATCH')).toBe(true));
    expect(api.sent.find((r) => r.method === 'PATCH')!.body).toEqual({ status: 'resolved' });
    expect(screen.queryByRole('textbox', { name: 'Note' })).toBeNull();
  });

  it('asks for the notes of the version shown, one cache entry per version, and marks those written on an older one', async () => {
    // docs/server.md: GET feedback?version=N gives the notes whose place that version still has.
    const byVersion: Record<string, FeedbackNote[]> = {
      '1': [note({ id: 7, version: 1, text: 'Only on the first version.' })],
      '2': [note({ id: 8, version: 2, text: 'Written on the second.' }), note({ id: 9, version: 1, row: 1 })],
    };
    const api = mockApi({
      'GET /api/patterns/4/feedback': (req) => ({
        json: { items: byVersion[new URL(req.url, 'http://x').searchParams.get('version') ?? ''] ?? [] },
      }),
    });
    const panel = (version: number) => (
      <FeedbackPanel
        patternId={4}
        version={version}
        picked={{ row: 1, unit: 1 }}
        current={{ row: 1, unit: 1 }}
        onPick={() => {}}
        canWrite={false}
        canResolve={false}
        onShow={() => {}}
      />
    );
    renderWithApp(panel(1));
    await screen.findByText('Only on the first version.');
    expect(screen.queryByText(/written on version/)).toBeNull();
    cleanup();
    renderWithApp(panel(2));
    await screen.findByText('Written on the second.');
    expect(screen.queryByText('Only on the first version.')).toBeNull();
    expect(screen.getAllByText(/written on version 1/)).toHaveLength(1);
    expect(api.sent.map((r) => r.url)).toEqual([
      '/api/patterns/4/feedback?version=1',
      '/api/patterns/4/feedback?version=2',
    ]);
  });

  it('writes a note on the picked unit, or on the whole row', async () => {
    const api = mockApi({
      'GET /api/patterns/4/feedback': { json: { items: [] } },
      'POST /api/patterns/4/feedback': { status: 201, json: note({}) },
    });
    renderWithApp(
      <FeedbackPanel
        patternId={4}
        version={2}
        picked={{ row: 3, unit: 2 }}
        current={{ row: 3, unit: 2 }}
        onPick={() => {}}
        canWrite
        canResolve={false}
        onShow={() => {}}
      />,
    );
    // The stepper is on the picked unit already: nothing to take.
    expect(screen.getByRole('button', { name: 'Use current unit (row 3, unit 2)' })).toHaveProperty('disabled', true);
    expect(screen.getByRole('heading', { name: 'Leave a note on row 3, unit 2' })).toBeTruthy();
    await userEvent.type(screen.getByRole('textbox', { name: 'Note' }), 'Tension slips here.');
    await userEvent.click(screen.getByRole('button', { name: 'Add note' }));
    await waitFor(() => expect(api.sent.filter((r) => r.method === 'POST')).toHaveLength(1));
    expect(api.sent.find((r) => r.method === 'POST')!.body).toEqual({
      row: 3,
      unit: 2,
      text: 'Tension slips here.',
      version: 2,
    });
    await userEvent.click(screen.getByRole('checkbox', { name: 'About the whole row' }));
    expect(screen.getByRole('heading', { name: 'Leave a note on row 3' })).toBeTruthy();
    await userEvent.type(screen.getByRole('textbox', { name: 'Note' }), 'Whole row.');
    await userEvent.click(screen.getByRole('button', { name: 'Add note' }));
    await waitFor(() => expect(api.sent.filter((r) => r.method === 'POST')).toHaveLength(2));
    expect(api.sent.filter((r) => r.method === 'POST')[1]!.body).toEqual({ row: 3, text: 'Whole row.', version: 2 });
  });
});

function NotesOnAChart({ current }: { current: StepPlace }) {
  const [picked, setPicked] = useState<StepPlace>({ row: 1, unit: 1 });
  return (
    <FeedbackPanel
      patternId={4}
      version={2}
      picked={picked}
      current={current}
      onPick={setPicked}
      canWrite
      canResolve={false}
      onShow={() => {}}
    />
  );
}

describe('picking the unit by keyboard', () => {
  it('takes the stepper’s current unit for the note with “Use current unit”', async () => {
    const api = mockApi({
      'GET /api/patterns/4/feedback': { json: { items: [] } },
      'POST /api/patterns/4/feedback': { status: 201, json: note({}) },
    });
    renderWithApp(<NotesOnAChart current={{ row: 5, unit: 3 }} />);
    expect(screen.getByRole('heading', { name: 'Leave a note on row 1, unit 1' })).toBeTruthy();
    const use = screen.getByRole('button', { name: 'Use current unit (row 5, unit 3)' });
    use.focus();
    await userEvent.keyboard('{Enter}');
    expect(screen.getByRole('heading', { name: 'Leave a note on row 5, unit 3' })).toBeTruthy();
    expect(use).toHaveProperty('disabled', true);
    await userEvent.type(screen.getByRole('textbox', { name: 'Note' }), 'Here.');
    await userEvent.click(screen.getByRole('button', { name: 'Add note' }));
    await waitFor(() => expect(api.sent.filter((r) => r.method === 'POST')).toHaveLength(1));
    expect(api.sent.find((r) => r.method === 'POST')!.body).toMatchObject({ row: 5, unit: 3 });
  });
});

describe('sharing', () => {
  it('creates a link shown once, revokes links, and invites a tester by e-mail', async () => {
    const access = {
      shares: [{ id: 9, createdAt: '2026-11-01T00:00:00.000Z', expiresAt: null, revoked: false, active: true }],
      testers: [{ id: 5, name: 'Odile Ferrant', email: 'odile@example.com', invitedAt: '2026-11-02T00:00:00.000Z' }],
    };
    const api = mockApi({
      'GET /api/patterns/4/access': { json: access },
      'POST /api/patterns/4/shares': {
        status: 201,
        json: { id: 10, token: 'tok', url: 'http://viewer.test/s/tok', expiresAt: null },
      },
      'DELETE /api/patterns/4/shares/9': { status: 204 },
      'POST /api/patterns/4/invites': {
        status: 201,
        json: { tester: { id: 6, name: 'Pell', email: 'pell@example.com' }, created: true },
      },
    });
    renderWithApp(<SharingPanel patternId={4} />);
    await screen.findByText(/odile@example.com/);
    await userEvent.type(screen.getByLabelText('Expires after (days, empty for never)'), '30');
    await userEvent.click(screen.getByRole('button', { name: 'Create share link' }));
    expect((await screen.findByTestId('share-url')).textContent).toBe('http://viewer.test/s/tok');
    expect(api.sent.find((r) => r.url === '/api/patterns/4/shares')!.body).toEqual({ expiresInDays: 30 });
    await userEvent.click(screen.getByRole('button', { name: /Revoke the link/ }));
    await waitFor(() =>
      expect(api.sent.some((r) => r.method === 'DELETE' && r.url === '/api/patterns/4/shares/9')).toBe(true),
    );
    await userEvent.type(screen.getByLabelText("Tester's e-mail"), 'pell@example.com');
    await userEvent.click(screen.getByRole('button', { name: 'Send invitation' }));
    expect((await screen.findByText('Invitation sent to pell@example.com.')).tagName).toBe('P');
    // Access is asked for again after each change, so the list is never stale.
    expect(api.sent.filter((r) => r.url === '/api/patterns/4/access').length).toBeGreaterThanOrEqual(3);
  });
});

const tally = (beads: number, a: number, b: number, rows: number): TallyJson => ({
  schema: 'fourfold.tally/1',
  title: 'T',
  beads,
  units: rows * 3,
  rows: Array.from({ length: rows }, (_, i) => ({ row: i + 1, units: 3, beads: 0 })),
  colors: [
    { key: 'A', name: 'chalk', hex: '#f4f1ea', count: a, grams: { low: 0, high: 0 }, buyGrams: 1 },
    { key: 'B', name: 'deep teal', hex: '#2e6f8e', count: b, grams: { low: 0, high: 0 }, buyGrams: 1 },
  ].filter((c) => c.count > 0),
  spare: 0.1,
  thread: { mm: 0, threads: 1 },
  size: { widthMm: 0, heightMm: 0 },
});

describe('count changes between versions', () => {
  it('lists what changed, including a colour that appears, and nothing when the counts agree', () => {
    // Source: NOTATION.md section 8, panels of 3 units by 4 and by 5 rows: 31 and 38 beads.
    expect(countChanges(tally(31, 31, 0, 4), tally(38, 19, 19, 5))).toEqual([
      { what: 'beads', before: 31, after: 38 },
      { what: 'units', before: 12, after: 15 },
      { what: 'rows', before: 4, after: 5 },
      { what: 'colour A (chalk)', before: 31, after: 19 },
      { what: 'colour B (deep teal)', before: 0, after: 19 },
    ]);
    expect(countChanges(tally(31, 15, 16, 4), tally(31, 15, 16, 4))).toEqual([]);
  });
});
