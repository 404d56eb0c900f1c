import { useQuery } from '@tanstack/react-query';
import { peopleQueries } from '../../features/people/api/people';
import { Empty, ErrorNote, Loading, PageHeader } from '../../components/ui/feedback';

export function Component() {
  const q = useQuery(peopleQueries.outbox());
  return (
    <div>
      <PageHeader title="Outbox" subtitle="Mail caught by the development mail server (no mail leaves this machine)" />
      {q.isPending ? (
        <Loading />
      ) : q.isError ? (
        <ErrorNote error={q.error} />
      ) : q.data.length === 0 ? (
        <Empty title="No mail yet" />
      ) : (
        <ul className="space-y-3">
          {q.data.map((m) => (
            <li key={m.id} className="rounded border border-line bg-panel p-3 text-sm">
              <p className="font-semibold">{m.subject}</p>
              <p className="text-xs text-ink-soft">
                To {m.to} · {new Date(m.createdAt).toLocaleString()}
              </p>
              <pre className="mt-2 whitespace-pre-wrap font-sans">{m.body}</pre>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
