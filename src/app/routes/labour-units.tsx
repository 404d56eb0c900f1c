import { useCallback } from 'react';
import { useQuery } from '@tanstack/react-query';
import { queryClient } from '../../lib/query-client';
import { hasRole, sessionQueries } from '../../features/auth/api/session';
import { ROLE_SETS } from '../../../shared/schemas/auth';
import { catalogueQueries, useUpdateLabourUnit } from '../../features/catalogue/api/catalogue';
import type { LabourUnitEntry } from '../../../shared/schemas/catalogue';
import { LabourUnitsTable } from '../../features/catalogue/components/labour-units-table';
import { ErrorNote, Loading, PageHeader } from '../../components/ui/feedback';

export async function loader() {
  await queryClient.ensureQueryData(catalogueQueries.labourUnits());
  return null;
}

export function Component() {
  const units = useQuery(catalogueQueries.labourUnits());
  const { data: me } = useQuery(sessionQueries.me());
  const canEdit = hasRole(me, ...ROLE_SETS.estimate);
  const update = useUpdateLabourUnit();
  const onChange = useCallback(
    (u: LabourUnitEntry, hours: number) => update.mutate({ key: u.key, version: u.version, hours }),
    [update.mutate],
  );
  return (
    <div className="max-w-5xl space-y-4">
      <PageHeader
        title="Labour units"
        subtitle="Shop hours per device mounted, per termination, per door device, per drive … Bills of materials take their labour from these when they are built."
      />
      {update.error ? <ErrorNote error={update.error} /> : null}
      {update.isSuccess ? (
        <p role="status" className="text-sm text-state-signed">
          ✔ Saved {update.data.key}: {update.data.hours} h. Rebuild a bill of materials to use it.
        </p>
      ) : null}
      {units.isPending ? (
        <Loading what="Loading labour units" />
      ) : units.isError ? (
        <ErrorNote error={units.error} />
      ) : (
        <LabourUnitsTable units={units.data} canEdit={canEdit} onChange={onChange} />
      )}
    </div>
  );
}
