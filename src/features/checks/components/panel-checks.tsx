import { useQuery } from '@tanstack/react-query';
import { checkQueries } from '../api/checks';
import { Caution, ErrorNote, Loading } from '../../../components/ui/feedback';
import { ControlConductorsSection } from './control-conductors';
import { ControlPowerSection } from './control-power-section';
import { GroupCircuitsSection } from './group-circuits-section';
import { HeatSection } from './heat-section';
import { NameplateSection } from './nameplate-section';
import { OtherSourcesSection } from './other-sources-section';
import { SccrSection } from './sccr-section';
import { SharedDrivesSection } from './shared-drives-section';

/** The engineer's panel checks: SCCR worksheet, heat load, control power transformer, nameplate and feeder. */
export function PanelChecks({ panelId }: { panelId: number }) {
  const q = useQuery(checkQueries.panel(panelId));
  if (q.isPending) return <Loading what="Working out the panel checks" />;
  if (q.isError) return <ErrorNote error={q.error} />;
  const c = q.data;
  return (
    <div className="space-y-4">
      {c.bom.note || c.motorsWithErrors.length > 0 || c.bom.unmatchedLines > 0 ? (
        <div className="rounded border border-state-review/40 bg-warn-bg px-3 py-2 text-sm">
          {c.bom.note ? <p>⚠ {c.bom.note}</p> : null}
          {c.bom.unmatchedLines > 0 ? (
            <p>
              ⚠ {c.bom.unmatchedLines} bill-of-materials line{c.bom.unmatchedLines > 1 ? 's have' : ' has'} no catalogue part: ratings and
              losses of those lines are assumed or missing.
            </p>
          ) : null}
          {c.motorsWithErrors.length > 0 ? <p>✖ Left out until fixed: {c.motorsWithErrors.join(', ')}</p> : null}
        </div>
      ) : null}
      <SccrSection sccr={c.sccr} />
      <HeatSection heat={c.heat} />
      <ControlPowerSection cp={c.controlPower} />
      <OtherSourcesSection os={c.otherSources} />
      <SharedDrivesSection sd={c.sharedDrives} />
      {c.groupCircuits ? <GroupCircuitsSection gc={c.groupCircuits} /> : null}
      {c.controlConductors ? <ControlConductorsSection cc={c.controlConductors} /> : null}
      <NameplateSection np={c.nameplate} />
      <Caution />
    </div>
  );
}
