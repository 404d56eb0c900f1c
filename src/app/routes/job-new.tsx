import { useNavigate } from 'react-router-dom';
import { useCreateJob } from '../../features/jobs/api/jobs';
import { JobForm } from '../../features/jobs/components/job-form';
import { PageHeader } from '../../components/ui/feedback';

export function Component() {
  const create = useCreateJob();
  const navigate = useNavigate();
  return (
    <div>
      <PageHeader title="New job" subtitle="The supply, fault current and ambient here drive every panel's checks" />
      <JobForm
        submitLabel="Create job"
        pending={create.isPending}
        error={create.error}
        onSubmit={(v) => create.mutate(v, { onSuccess: (job) => navigate(`/jobs/${job.id}`) })}
      />
    </div>
  );
}
