/** The library: the reader's patterns, searched, sorted and paged by the server; the URL holds the state. */
import { useEffect, useState } from 'react';
import { useQuery, type QueryClient } from '@tanstack/react-query';
import { Link, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { useSession } from '../api/session.js';
import { defaultListParams, patternListQuery, type ListParams, type SortKey } from '../queries/patterns.js';
import { Pager, PatternTable } from '../components/pattern-table.js';
import { QueryError } from '../components/query-error.js';

const SORTS: SortKey[] = ['updated', 'title', 'beads'];

export function paramsFrom(search: URLSearchParams): ListParams {
  const sort = search.get('sort') as SortKey | null;
  const page = Number(search.get('page'));
  return {
    ...defaultListParams,
    q: search.get('q') ?? '',
    sort: sort && SORTS.includes(sort) ? sort : defaultListParams.sort,
    dir:
      search.get('dir') === 'asc' ? 'asc' : search.get('dir') === 'desc' ? 'desc' : sort === 'title' ? 'asc' : 'desc',
    page: Number.isInteger(page) && page > 0 ? page : 1,
  };
}

export const libraryLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await queryClient.ensureQueryData(patternListQuery(paramsFrom(new URL(request.url).searchParams)));
    return null;
  };

function toSearch(p: ListParams): Record<string, string> {
  const out: Record<string, string> = {};
  if (p.q) out.q = p.q;
  if (p.sort !== defaultListParams.sort || p.dir !== 'desc') Object.assign(out, { sort: p.sort, dir: p.dir });
  if (p.page > 1) out.page = String(p.page);
  return out;
}

export function LibraryPage() {
  const [search, setSearch] = useSearchParams();
  const params = paramsFrom(search);
  const list = useQuery(patternListQuery(params));
  const session = useSession();
  const [q, setQ] = useState(params.q);
  const change = (p: ListParams) => setSearch(toSearch(p));
  // Back and forward change the URL under the box: the box shows what the list was searched for.
  useEffect(() => setQ(params.q), [params.q]);
  // Search as the reader types, a moment after they stop.
  useEffect(() => {
    if (q === params.q) return;
    const t = setTimeout(() => setSearch(toSearch({ ...params, q, page: 1 })), 300);
    return () => clearTimeout(t);
  }, [q]);

  return (
    <section aria-labelledby="library-title">
      <div className="mb-4 flex flex-wrap items-center justify-between gap-x-6 gap-y-3">
        <h1 id="library-title">Library</h1>
        <form
          role="search"
          className="flex w-full items-center gap-2 sm:w-auto"
          onSubmit={(e) => {
            // Enter searches at once instead of waiting for the pause.
            e.preventDefault();
            if (q !== params.q) setSearch(toSearch({ ...params, q, page: 1 }));
          }}
        >
          <label htmlFor="library-search" className="shrink-0 text-sm font-semibold">
            Search titles
          </label>
          <input
            id="library-search"
            className="input min-w-0 flex-1 sm:w-72"
            type="search"
            value={q}
            onChange={(e) => setQ(e.target.value)}
          />
        </form>
      </div>
      {list.isPending && <p role="status">Loading patterns…</p>}
      {list.isError && <QueryError error={list.error} retry={() => list.refetch()} />}
      {list.data && list.data.total === 0 && !params.q && <EmptyLibrary designer={session?.user.role === 'designer'} />}
      {list.data && list.data.total === 0 && params.q && <p role="status">No pattern title contains “{params.q}”.</p>}
      {list.data && list.data.total > 0 && (
        <div aria-busy={list.isFetching}>
          <PatternTable items={list.data.items} params={params} onChange={change} />
          <Pager total={list.data.total} params={params} onChange={change} />
        </div>
      )}
    </section>
  );
}

function EmptyLibrary({ designer }: { designer: boolean }) {
  return (
    <div className="card max-w-xl">
      <h2>No patterns yet</h2>
      {designer ? (
        <>
          <p className="mt-2">
            <Link className="link" to="/upload">
              Upload pattern files
            </Link>{' '}
            or paste a pattern, or send them from the terminal:
          </p>
          <pre className="mt-2 overflow-x-auto rounded bg-slate-100 p-2 font-mono text-sm dark:bg-slate-800">
            fourfold login --server {window.location.origin}
            {'\n'}fourfold push my-pattern.ffp
          </pre>
        </>
      ) : (
        <p className="mt-2">When a designer shares a pattern with you, it appears here.</p>
      )}
    </div>
  );
}
