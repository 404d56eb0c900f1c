import { useParams } from 'react-router-dom';
import { ActivityList } from '../../../features/jobs/components/activity-list';

export function Component() {
  const { jobId, panelId } = useParams();
  return <ActivityList jobId={Number(jobId)} panelId={Number(panelId)} />;
}
