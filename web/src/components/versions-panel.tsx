/** Every version, newest first; viewing one shows how its counts differ from the version before it. */
import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import type { TallyJson } from '../api/types.js';
import { tallyQuery, versionsQuery } from '../queries/patterns.js';
import { QueryError } from './query-error.js';

export interface CountChange {
  what: string;
  before: number;
  after: number;
}

/** Changes in total beads, units, rows and beads per colour between two tallies. */
export function countChanges(before: TallyJson, after: TallyJson): CountChange[] {
  const out: CountChange[] = [];
  const push = (what: string, a: number, b: number) => a !== b && out.push({ what, before: a, after: b });
  push('beads', before.beads, after.beads);
  push('units', before.units, after.units);
  push('rows', before.rows.length, after.rows.length);
  const keys = [...new Set([...before.colors, ...after.colors].map((c) => c.key))].sort();
  for (const key of keys) {
    const a = before.colors.find((c) => c.key === key);
    const b = after.colors.find((c) => c.key === key);
    push(`colour ${key}${(b ?? a)?.name ? ` (${(b ?? a)!.name})` : ''}`, a?.count ?? 0, b?.count ?? 0);
  }
  return out;
}

export function VersionsPanel({
  patternId,
  viewing,
  current,
}: {
  patternId: number;
  viewing: number;
  current: number;
}) {
  const versions = useQuery(versionsQuery(patternId));
  const previous = viewing > 1 ? viewing - 1 : undefined;
  const now = useQuery(tallyQuery(patternId, viewing));
  const before = useQuery({ ...tallyQuery(patternId, previous ?? 0), enabled: previous !== undefined });
  if (versions.isPending) return <p role="status">Loading versions…</p>;
  if (versions.isError) return <QueryError error={versions.error} retry={() => versions.refetch()} />;
  const changes = now.data && before.data ? countChanges(before.data, now.data) : null;
  return (
    <div className="space-y-4">
      {previous !== undefined && (
        <div aria-live="polite">
          <h3 className="font-semibold">
            Version {viewing} against version {previous}
          </h3>
          {changes === null ? (
            now.isError || before.isError ? (
              <p className="muted text-sm">The counts of one of these versions could not be worked out.</p>
            ) : (
              <p role="status">Comparing…</p>
            )
          ) : changes.length === 0 ? (
            <p className="text-sm">The counts are the same.</p>
          ) : (
            <ul className="text-sm" data-testid="count-changes">
              {changes.map((c) => (
                <li key={c.what}>
                  {c.what}: {c.before} → {c.after} ({c.after > c.before ? '+' : ''}
                  {c.after - c.before})
                </li>
              ))}
            </ul>
          )}
        </div>
      )}
      <ol className="space-y-1 text-sm" aria-label="Versions">
        {versions.data.items.map((v) => (
          <li key={v.number} className="flex flex-wrap gap-2">
            {v.number === viewing ? (
              <span className="font-semibold" aria-current="true">
                Version {v.number} (shown)
              </span>
            ) : (
              <Link
                className="link"
                to={v.number === current ? `/patterns/${patternId}` : `/patterns/${patternId}?version=${v.number}`}
              >
                Version {v.number}
              </Link>
            )}
            <span className="muted">
              {new Date(v.createdAt).toLocaleString()} by {v.author.name}
              {v.errors > 0 ? ` · ${v.errors} errors` : ''}
              {v.number === current ? ' · current' : ''}
            </span>
          </li>
        ))}
      </ol>
    </div>
  );
}
