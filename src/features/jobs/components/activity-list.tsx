import { useQuery } from '@tanstack/react-query';
import { jobQueries } from '../api/jobs';
import { Empty, ErrorNote, Loading } from '../../../components/ui/feedback';

export function ActivityList({ jobId, panelId }: { jobId: number; panelId?: number }) {
  const q = useQuery(jobQueries.activity(jobId));
  if (q.isPending) return <Loading what="Loading activity" />;
  if (q.isError) return <ErrorNote error={q.error} />;
  const rows = panelId ? q.data.filter((a) => a.panelId === panelId) : q.data;
  if (rows.length === 0) return <Empty title="No activity yet" />;
  return (
    <ol className="divide-y divide-line rounded border border-line bg-panel text-sm">
      {rows.map((a) => (
        <li key={a.id} className="flex gap-4 px-3 py-2">
          <time className="w-40 shrink-0 text-ink-soft" dateTime={a.at}>
            {new Date(a.at).toLocaleString()}
          </time>
          <span className="w-36 shrink-0 font-semibold">{a.user ?? 'system'}</span>
          <span>{a.summary}</span>
        </li>
      ))}
    </ol>
  );
}
