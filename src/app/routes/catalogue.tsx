import { useCallback, useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { queryClient } from '../../lib/query-client';
import { hasRole, sessionQueries } from '../../features/auth/api/session';
import { ROLE_SETS } from '../../../shared/schemas/auth';
import { CATALOGUE_EXPORT, catalogueQueries, useCreateItem, useUpdateItem } from '../../features/catalogue/api/catalogue';
import type { CatalogueEntry, ItemChanges } from '../../../shared/schemas/catalogue';
import { CatalogueTable } from '../../features/catalogue/components/catalogue-table';
import { AddItemForm } from '../../features/catalogue/components/add-item-form';
import { ImportPanel } from '../../features/catalogue/components/import-panel';
import { ItemHistory } from '../../features/catalogue/components/item-history';
import { CombinationsSection } from '../../features/catalogue/components/combinations-section';
import { ErrorNote, Loading, PageHeader } from '../../components/ui/feedback';
import { Button } from '../../components/ui/button';

const LIST = { active: 'all' } as const;

export async function loader() {
  await queryClient.ensureQueryData(catalogueQueries.list(LIST));
  return null;
}

export function Component() {
  const items = useQuery(catalogueQueries.list(LIST));
  const { data: me } = useQuery(sessionQueries.me());
  const canEdit = hasRole(me, ...ROLE_SETS.estimate);
  const update = useUpdateItem();
  const create = useCreateItem();
  const [panel, setPanel] = useState<'none' | 'add' | 'import'>('none');
  const [history, setHistory] = useState<CatalogueEntry | null>(null);
  const onChange = useCallback(
    (item: CatalogueEntry, changes: ItemChanges) => update.mutate({ id: item.id, version: item.version, changes }),
    [update.mutate],
  );
  const onHistory = useCallback((item: CatalogueEntry) => setHistory((h) => (h?.id === item.id ? null : item)), []);
  return (
    <div className="space-y-4">
      <PageHeader
        title="Catalogue"
        subtitle={
          canEdit
            ? "The shop's parts, prices, labour adders and lead times. Click a number to change it."
            : "The shop's parts and prices (read only for your role)."
        }
        actions={
          <>
            <a
              className="rounded border border-line bg-panel px-3 py-1.5 text-sm font-semibold hover:border-copper-500"
              href={CATALOGUE_EXPORT.xlsx}
              download
            >
              Export .xlsx
            </a>
            <a
              className="rounded border border-line bg-panel px-3 py-1.5 text-sm font-semibold hover:border-copper-500"
              href={CATALOGUE_EXPORT.csv}
              download
            >
              Export .csv
            </a>
            {canEdit ? (
              <>
                <Button
                  variant="secondary"
                  aria-expanded={panel === 'import'}
                  onClick={() => setPanel(panel === 'import' ? 'none' : 'import')}
                >
                  Import…
                </Button>
                <Button aria-expanded={panel === 'add'} onClick={() => setPanel(panel === 'add' ? 'none' : 'add')}>
                  + Add item
                </Button>
              </>
            ) : null}
          </>
        }
      />
      {panel === 'add' && canEdit ? (
        <AddItemForm
          pending={create.isPending}
          error={create.error}
          onCancel={() => setPanel('none')}
          onSubmit={(v) => create.mutate(v, { onSuccess: () => setPanel('none') })}
        />
      ) : null}
      {create.isSuccess && panel === 'none' ? (
        <p role="status" className="text-sm text-state-signed">
          ✔ Added {create.data.code}.
        </p>
      ) : null}
      {panel === 'import' && canEdit ? <ImportPanel /> : null}
      {update.error ? <ErrorNote error={update.error} /> : null}
      {history ? <ItemHistory item={history} onClose={() => setHistory(null)} /> : null}
      {items.isPending ? (
        <Loading what="Loading the catalogue" />
      ) : items.isError ? (
        <ErrorNote error={items.error} />
      ) : (
        <CatalogueTable items={items.data} canEdit={canEdit} onChange={onChange} onHistory={onHistory} historyOf={history?.id ?? null} />
      )}
      <CombinationsSection canEdit={hasRole(me, ...ROLE_SETS.editCombinations)} />
      <p className="text-xs text-ink-soft">
        Prices are the shop's own. A change here does not alter a bill of materials already priced: its lines keep the unit cost they were
        priced at until the estimator re-prices them.
      </p>
    </div>
  );
}
