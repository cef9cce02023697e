import { describe, expect, it, vi } from 'vitest';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { UploadPanel } from '../../web/src/components/upload-panel.js';
import type { CheckedFile } from '../../web/src/api/types.js';
import { mockApi, renderWithApp } from './helpers.js';

const range = { line: 9, column: 14, endLine: 9, endColumn: 17, offset: 120, endOffset: 123 };
const good: CheckedFile = { name: 'band.ffp', ok: true, title: 'Harbour Band', diagnostics: [], tally: null };
const broken: CheckedFile = {
  name: 'fan.ffp',
  ok: false,
  title: 'Kestrel Fan',
  diagnostics: [
    {
      severity: 'error',
      id: 'bead-count',
      message:
        'row 2, unit 3: this unit shares its near bead and a base bead, so it takes 2 new beads; 3 are written (C C B).',
      hint: "Mark an increase with '+' if that is meant.",
      range,
    },
  ],
  tally: null,
};

const file = (name: string, text: string) => new File([text], name, { type: '' });

describe('upload', () => {
  it('checks dropped files first, shows each file’s diagnostics, and saves with errors marked', async () => {
    const api = mockApi({
      'POST /api/check': { json: { files: [good, broken] } },
      'POST /api/patterns': {
        status: 201,
        json: {
          items: [
            { id: 7, title: 'Harbour Band', diagnostics: [] },
            { id: 8, title: 'Kestrel Fan', diagnostics: broken.diagnostics },
          ],
        },
      },
    });
    const onSaved = vi.fn();
    renderWithApp(<UploadPanel onSaved={onSaved} />);
    await userEvent.upload(screen.getByLabelText('Pattern files'), [
      file('band.ffp', 'title: Harbour Band\n'),
      file('fan.ffp', 'title: Kestrel Fan\n'),
    ]);

    const fan = await screen.findByRole('article', { name: 'fan.ffp' });
    expect(within(fan).getByText('1 error')).toBeTruthy();
    expect(within(fan).getByText('9:14')).toBeTruthy();
    expect(within(fan).getByText(/takes 2 new beads; 3 are written/)).toBeTruthy();
    expect(within(fan).getByText("Mark an increase with '+' if that is meant.")).toBeTruthy();
    expect(within(screen.getByRole('article', { name: 'band.ffp' })).getByText('No problems found')).toBeTruthy();

    const check = api.sent.find((r) => r.url === '/api/check')!;
    expect((check.body as FormData).getAll('file').map((f) => (f as File).name)).toEqual(['band.ffp', 'fan.ffp']);
    expect(api.sent.some((r) => r.url === '/api/patterns')).toBe(false);

    await userEvent.click(screen.getByRole('button', { name: 'Save these 2 patterns (with errors)' }));
    await waitFor(() => expect(onSaved).toHaveBeenCalledTimes(1));
    expect(onSaved.mock.calls[0]![0].map((i: { id: number }) => i.id)).toEqual([7, 8]);
    const saved = api.sent.find((r) => r.url === '/api/patterns')!;
    expect(saved.method).toBe('POST');
    expect((saved.body as FormData).getAll('file')).toHaveLength(2);
  });

  it('checks pasted text as JSON and refuses files that are not .ffp before asking the server', async () => {
    const api = mockApi({ 'POST /api/check': { json: { files: [{ ...good, name: 'pasted.ffp' }] } } });
    renderWithApp(<UploadPanel onSaved={() => {}} />);
    // As a drop would: the browser's own file picker filter is not what refuses the file.
    await userEvent
      .setup({ applyAccept: false })
      .upload(screen.getByLabelText('Pattern files'), [file('photo.png', 'not a pattern')]);
    expect((await screen.findByRole('alert')).textContent).toContain('photo.png: not a .ffp file');
    expect(api.sent).toHaveLength(0);

    await userEvent.type(screen.getByLabelText('Or paste a pattern'), 'title: Harbour Band');
    await userEvent.click(screen.getByRole('button', { name: 'Check the pasted pattern' }));
    await screen.findByRole('article', { name: 'pasted.ffp' });
    expect(api.sent[0]!.body).toEqual({ source: 'title: Harbour Band', name: 'pasted.ffp' });
    expect(screen.getByRole('button', { name: 'Save this pattern' })).toBeTruthy();
  });

  it('shows the server’s refusal in words', async () => {
    mockApi({
      'POST /api/check': { status: 413, json: { error: { code: 'too-large', message: 'A file is over 1 MiB.' } } },
    });
    renderWithApp(<UploadPanel onSaved={() => {}} />);
    await userEvent.type(screen.getByLabelText('Or paste a pattern'), 'x');
    await userEvent.click(screen.getByRole('button', { name: 'Check the pasted pattern' }));
    expect((await screen.findByRole('alert')).textContent).toBe('A file is over 1 MiB.');
  });
});
