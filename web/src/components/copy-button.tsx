import { useState } from 'react';

/** Copies to the clipboard and says so; where the clipboard is refused the text stays selectable beside it. */
export function CopyButton({ text, label }: { text: string; label: string }) {
  const [copied, setCopied] = useState<'no' | 'yes' | 'failed'>('no');
  const copy = () =>
    navigator.clipboard
      ?.writeText(text)
      .then(() => setCopied('yes'))
      .catch(() => setCopied('failed')) ?? setCopied('failed');
  return (
    <span className="mt-2 inline-flex items-center gap-2">
      <button type="button" className="btn" onClick={() => void copy()}>
        {label}
      </button>
      <span aria-live="polite" className="text-sm">
        {copied === 'yes' ? 'Copied' : copied === 'failed' ? 'Copy it by hand' : ''}
      </span>
    </span>
  );
}
