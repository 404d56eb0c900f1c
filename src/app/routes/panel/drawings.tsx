import { useQuery } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { panelQueries } from '../../../features/panels/api/panels';
import { checkQueries, submittalPdfUrl } from '../../../features/checks/api/checks';
import { motorFeed } from '../../../../shared/calc/other-sources';
import { sharedDriveOf } from '../../../../shared/calc/shared-drive-one-line';
import { motorGroup } from '../../../../shared/calc/group-circuits';
import { Bucket } from '../../../features/drawings/components/bucket';
import { Sheets } from '../../../features/drawings/components/sheets';
import { queryClient } from '../../../lib/query-client';
import { drawingQueries } from '../../../features/drawings/api/drawings';
import { Caution, Empty, ErrorNote, Loading } from '../../../components/ui/feedback';

export async function loader({ params }: LoaderFunctionArgs) {
  const id = Number(params.panelId);
  await Promise.all([
    queryClient.ensureQueryData(panelQueries.detail(id)),
    queryClient.prefetchQuery(checkQueries.panel(id)),
    queryClient.prefetchQuery(drawingQueries.panel(id)),
  ]);
  return null;
}

export function Component() {
  const { panelId } = useParams();
  const id = Number(panelId);
  const panel = useQuery(panelQueries.detail(id));
  const checks = useQuery(checkQueries.panel(id));
  const drawings = useQuery(drawingQueries.panel(id));
  if (panel.isPending) return <Loading what="Loading drawings" />;
  if (panel.isError) return <ErrorNote error={panel.error} />;
  const p = panel.data;
  const cards = new Map((checks.data?.connectionCards ?? []).map((c) => [c.loadId, c]));
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p className="text-sm text-ink-soft">
          Control schematic per bucket, terminal plan, wire list and panel marking, generated from the stored selections and the bill of
          materials; one-line and lead connection of each motor (NEMA MG 1 lead markings).
        </p>
        {p.loads.length > 0 ? (
          <a
            href={submittalPdfUrl(id)}
            download
            className="inline-flex items-center gap-1.5 rounded bg-copper-600 px-3 py-1.5 text-sm font-semibold text-white hover:bg-copper-700"
          >
            <span aria-hidden>⤓</span> Download submittal (PDF)
          </a>
        ) : null}
      </div>
      {p.loads.length > 0 && drawings.isError ? <ErrorNote error={drawings.error} /> : null}
      {p.loads.length > 0 && drawings.data ? <Sheets panelId={id} view={drawings.data} /> : null}
      {checks.isError ? <ErrorNote error={checks.error} /> : null}
      {checks.isPending ? <Loading what="Working out the connection cards" /> : null}
      {p.loads.length === 0 ? (
        <Empty title="No motors on this panel yet">Add motors to see their one-lines and connection cards.</Empty>
      ) : (
        p.loads.map((l) => (
          <Bucket
            key={l.id}
            load={l}
            card={cards.get(l.id)}
            feed={motorFeed(p.rollup, l.tag)}
            drive={sharedDriveOf(p.rollup, l.tag)}
            group={motorGroup(p.rollup, l.tag)}
          />
        ))
      )}
      <Caution />
    </div>
  );
}
