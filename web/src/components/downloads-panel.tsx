/**
 * Downloads come from the server, never from the browser's drawing, so each
 * file is byte for byte what the CLI writes for the same version.
 */
import { useState } from 'react';
import { apiBlob, withQuery } from '../api/client.js';
import { errorText } from './field.js';

export interface DownloadItem {
  label: string;
  path: string;
  query?: Record<string, string>;
  ext: string;
}

export const slug = (title: string): string =>
  title
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '') || 'pattern';

export const patternDownloads = (id: number): DownloadItem[] => [
  { label: 'Chart (SVG)', path: `/api/patterns/${id}/chart.svg`, ext: 'svg' },
  { label: 'Chart (PNG)', path: `/api/patterns/${id}/chart.png`, ext: 'png' },
  { label: 'Steps (Markdown)', path: `/api/patterns/${id}/steps`, query: { format: 'md' }, ext: 'md' },
  { label: 'Steps (HTML)', path: `/api/patterns/${id}/steps`, query: { format: 'html' }, ext: 'html' },
  { label: 'Kit sheet (HTML)', path: `/api/patterns/${id}/kit`, query: { format: 'html' }, ext: 'kit.html' },
  { label: 'Model (JSON)', path: `/api/patterns/${id}/model`, ext: 'model.json' },
];

export const sharedDownloads = (token: string): DownloadItem[] => {
  const base = `/api/shared/${encodeURIComponent(token)}`;
  return [
    { label: 'Chart (SVG)', path: `${base}/chart.svg`, ext: 'svg' },
    { label: 'Chart (PNG)', path: `${base}/chart.png`, ext: 'png' },
    { label: 'Steps (Markdown)', path: `${base}/steps`, query: { format: 'md' }, ext: 'md' },
    { label: 'Steps (HTML)', path: `${base}/steps`, query: { format: 'html' }, ext: 'html' },
  ];
};

function save(blob: Blob, name: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

export function DownloadsPanel({
  items,
  title,
  version,
  anonymous,
}: {
  items: DownloadItem[];
  title: string;
  version?: number;
  anonymous?: boolean;
}) {
  const [busy, setBusy] = useState<string | null>(null);
  const [error, setError] = useState<unknown>(null);
  const download = async (item: DownloadItem) => {
    setBusy(item.label);
    setError(null);
    try {
      const blob = await apiBlob(withQuery(item.path, { ...item.query, version }), { anonymous });
      save(blob, `${slug(title)}${version ? `-v${version}` : ''}.${item.ext}`);
    } catch (e) {
      setError(e);
    } finally {
      setBusy(null);
    }
  };
  return (
    <div>
      <ul className="flex flex-wrap gap-2">
        {items.map((item) => (
          <li key={item.label}>
            <button type="button" className="btn" disabled={busy !== null} onClick={() => void download(item)}>
              {busy === item.label ? 'Downloading…' : item.label}
            </button>
          </li>
        ))}
      </ul>
      {error !== null && (
        <p role="alert" className="error-text mt-2 text-sm">
          {errorText(error)}
        </p>
      )}
    </div>
  );
}
