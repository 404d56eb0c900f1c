import { useQuery } from '@tanstack/react-query';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { queryClient } from '../../../lib/query-client';
import { panelQueries } from '../../../features/panels/api/panels';
import { MotorWizard } from '../../../features/panels/components/motor-wizard/motor-wizard';

// The form takes a saved motor's answers as its defaults on the first render: the panel must be in the cache by then.
export async function loader({ params }: LoaderFunctionArgs) {
  await queryClient.ensureQueryData(panelQueries.detail(Number(params.panelId)));
  return null;
}

export function Component() {
  const { panelId, loadId, jobId } = useParams();
  const navigate = useNavigate();
  const { data: panel } = useQuery(panelQueries.detail(Number(panelId)));
  if (!panel) return null;
  return (
    <MotorWizard
      panelId={Number(panelId)}
      panel={panel}
      loadId={loadId ? Number(loadId) : undefined}
      onDone={() => navigate(`/jobs/${jobId}/panels/${panelId}/motors`)}
    />
  );
}
