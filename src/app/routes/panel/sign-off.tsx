import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { panelQueries, usePanelAction } from '../../../features/panels/api/panels';
import { hasRole, sessionQueries } from '../../../features/auth/api/session';
import { SignOffState } from '../../../components/ui/status';
import { Caution } from '../../../components/ui/feedback';
import { ApiError, get } from '../../../lib/api-client';
import type { SignOffEligibility } from '../../../../shared/schemas/panel';
import { checkQueries } from '../../../features/checks/api/checks';
import { SignOffFindings, sccrFallsShort } from '../../../features/checks/components/sign-off-findings';
import { LimitingParts } from '../../../features/bom/components/limiting-parts';
import { SwappedParts } from '../../../features/bom/components/swapped-parts';
import { bomQueries } from '../../../features/bom/api/bom';
import { OverrideList } from '../../../features/panels/components/sign-off/override-list';
import { RevisionCompare } from '../../../features/panels/components/sign-off/revision-compare';
import { PanelComments, RevisionList } from '../../../features/panels/components/sign-off/panel-history';
import {
  SccrAcknowledgement,
  SignOffActions,
  signWaitsFor,
  type SignOffAction,
} from '../../../features/panels/components/sign-off/sign-off-actions';

export function Component() {
  const panelId = Number(useParams().panelId);
  const { data: p } = useQuery(panelQueries.detail(panelId));
  const { data: me } = useQuery(sessionQueries.me());
  const act = usePanelAction(panelId);
  const [comment, setComment] = useState('');
  const [acknowledged, setAcknowledged] = useState(false);
  const reviewing = p?.status === 'in_review' && hasRole(me, 'engineer');
  const checks = useQuery({ ...checkQueries.panel(panelId), enabled: reviewing });
  const bom = useQuery({ ...bomQueries.panel(panelId), enabled: reviewing });
  // separation of duties: the server refuses a sign-off by someone who submitted or changed the panel
  const own = useQuery({
    queryKey: [...panelQueries.detail(panelId).queryKey, 'sign-off-eligibility', p?.version],
    queryFn: () => get<SignOffEligibility>(`/api/panels/${panelId}/sign-off-eligibility`),
    enabled: reviewing,
  });
  if (!p) return null;
  const isDesigner = hasRole(me, 'designer', 'admin');
  const isEngineer = hasRole(me, 'engineer');
  const canSubmit = isDesigner && (p.status === 'draft' || p.status === 'returned');
  const canReview = isEngineer && p.status === 'in_review';
  const run = (action: SignOffAction) =>
    act.mutate(
      { action, version: p.version, comment, acknowledgeSccr: acknowledged },
      {
        onSuccess: () => {
          setComment('');
          setAcknowledged(false);
        },
      },
    );
  // NEC 409.22: a panel rated below the site's available fault current is signed off only with an
  // acknowledgement and a written reason; the checks' verdict, or the server's own (it works the rating
  // out from the rebuilt bill of materials)
  const serverAsks = act.error instanceof ApiError && act.error.fieldIssues.some((i) => i.path === 'body.acknowledgeSccr');
  const needsAck = canReview && (sccrFallsShort(checks.data) || serverAsks);
  const overrides = p.loads.reduce((n, l) => n + l.overrides.length, 0);
  const lines = bom.data?.lines ?? [];
  const swaps = lines.filter((l) => l.source === 'swapped').length;
  const assumed = p.loads.reduce((n, l) => n + (l.selection?.assumed.length ?? 0), 0);
  const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;
  return (
    <div className="grid gap-5 lg:grid-cols-[minmax(0,1fr)_380px]">
      <div className="space-y-5">
        <section className="rounded border border-line bg-panel p-4">
          <h2 className="mb-2 flex items-center gap-2 text-lg font-semibold">
            Sign-off <SignOffState state={p.status} />
          </h2>
          <p className="mb-3 text-sm text-ink-soft">
            Draft → In review → Signed off (a frozen revision) or Returned. Changing a signed-off panel opens a new draft.
          </p>
          {canReview ? (
            <div className="rounded border border-line px-3 py-2 text-sm" role="group" aria-label="Before you sign">
              <p className="mb-1 text-xs font-semibold uppercase text-ink-soft">Before you sign</p>
              <SignOffFindings
                checks={checks.data}
                pending={checks.isPending}
                limiting={checks.data ? <LimitingParts rows={checks.data.sccr.limiting} /> : null}
              />
              <p className="text-ink-soft">
                {plural(overrides, 'override')}, {plural(swaps, 'swapped part')} and {plural(assumed, 'assumed input')} to review
                {checks.data?.bom.stale
                  ? ' (the bill of materials is out of date: the sign-off rebuilds it, keeping the swaps that still fit)'
                  : ''}
                .
              </p>
              <div className="mt-1 grid gap-3 md:grid-cols-2">
                <OverrideList loads={p.loads} />
                <SwappedParts lines={lines} pending={bom.isPending} />
              </div>
              {needsAck ? <SccrAcknowledgement acknowledged={acknowledged} onChange={setAcknowledged} comment={comment} /> : null}
            </div>
          ) : null}
          <SignOffActions
            status={p.status}
            nextRevision={p.revisionNumber === null ? 0 : p.revisionNumber + 1}
            canSubmit={canSubmit}
            canReview={canReview}
            isDesigner={isDesigner}
            isEngineer={isEngineer}
            comment={comment}
            onComment={setComment}
            signWaitsFor={signWaitsFor({ pending: act.isPending, selfRefused: own.data?.reason ?? null, needsAck, acknowledged, comment })}
            pending={act.isPending}
            error={act.error}
            eligibility={own.data}
            onRun={run}
          />
          <div className="mt-3">
            <Caution compact />
          </div>
        </section>
        <RevisionCompare panelId={panelId} revisions={p.revisions ?? []} />
      </div>
      <aside className="space-y-4">
        <RevisionList revisions={p.revisions ?? []} />
        <PanelComments panel={p} />
      </aside>
    </div>
  );
}
