import { useQuery } from '@tanstack/react-query';
import type { PanelDetail } from '../../../../shared/schemas/panel';
import { panelQueries, useReselect } from '../api/panels';
import { Button } from '../../../components/ui/button';
import { ErrorNote } from '../../../components/ui/feedback';
import { DecisionDifferences } from './decision-differences';

/**
 * Stored selections that the current rules and tables would make differently (a release changed a
 * rule file or a table since the motors were saved): which motors, which decisions, and for the
 * panel builder the way to select them again.
 */
export function RuleCheckBanner({ panel, canEdit }: { panel: PanelDetail; canEdit: boolean }) {
  const check = useQuery(panelQueries.ruleCheck(panel.id, panel.version));
  const reselect = useReselect(panel.id);
  const changed = check.data?.changed ?? [];
  if (!changed.length)
    return reselect.isSuccess ? (
      <p className="mb-3 text-sm" role="status">
        ✔ Selected again under the current rules.
      </p>
    ) : null;
  const n = changed.length;
  return (
    <section aria-label="Current rules" className="mb-3 rounded border border-state-review/50 bg-warn-bg px-3 py-2 text-sm">
      <div className="flex flex-wrap items-center gap-2">
        <p className="font-semibold">
          ⟳ {n} of {check.data!.motorCount} motor{check.data!.motorCount === 1 ? '' : 's'} would select differently under the current rules
          and tables.
        </p>
        <span className="text-ink-soft">Their stored selections were made by an earlier release.</span>
        {canEdit && panel.status !== 'in_review' ? (
          <Button className="ml-auto" disabled={reselect.isPending} onClick={() => reselect.mutate({ version: panel.version })}>
            {reselect.isPending
              ? 'Selecting…'
              : panel.status === 'signed_off'
                ? `Select again (opens a draft after R${panel.revisionNumber})`
                : 'Select again'}
          </Button>
        ) : (
          <span className="ml-auto text-ink-soft">
            {panel.status === 'in_review'
              ? 'The engineer returns the panel before its motors can be selected again.'
              : 'A panel builder can select them again.'}
          </span>
        )}
      </div>
      <details className="mt-1">
        <summary className="cursor-pointer text-xs font-semibold text-ink-soft">
          What would change ({changed.reduce((k, c) => k + c.differences.length, 0)} decisions)
        </summary>
        <div className="mt-1">
          <DecisionDifferences
            motors={changed}
            before="Stored"
            after="Current rules"
            label="What the current rules would change"
            className="text-xs"
          />
        </div>
      </details>
      {reselect.error ? <ErrorNote error={reselect.error} /> : null}
    </section>
  );
}
