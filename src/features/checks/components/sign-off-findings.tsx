import type { ReactNode } from 'react';
import type { PanelChecks } from '../../../../shared/schemas/checks';

/** Whether the panel's short-circuit rating asks the engineer for an acknowledgement (NEC 409.22). */
export function sccrFallsShort(checks: PanelChecks | undefined): boolean {
  const verdict = checks?.sccr.verdict;
  return verdict === 'below-available' || verdict === 'incomplete';
}

function sccrSentence(sccr: PanelChecks['sccr'], short: boolean): string {
  if (sccr.verdict === 'incomplete') return 'Panel SCCR could not be determined from the bill of materials (UL 508A SB4).';
  if (sccr.verdict === 'no-available-fault-current')
    return `Panel SCCR ${sccr.panelSccrKa} kA; the job gives no available fault current to compare (NEC 409.22).`;
  return `Panel SCCR ${sccr.panelSccrKa} kA ${short ? 'is below' : 'covers'} the ${sccr.availableFaultKa} kA available at the site (NEC 409.22).`;
}

/**
 * What the checks say before an engineer signs: the short-circuit rating against the site (with the parts
 * that limit it, handed in as `limiting`), the heat inside the enclosure and an undersized control transformer.
 */
export function SignOffFindings({ checks, pending, limiting }: { checks: PanelChecks | undefined; pending: boolean; limiting: ReactNode }) {
  const sccr = checks?.sccr;
  const short = sccrFallsShort(checks);
  const heat = checks?.heat.result;
  return (
    <>
      {sccr ? (
        <p className={short ? 'font-semibold text-state-returned' : 'text-state-signed'} data-testid="sign-off-sccr">
          {short ? '✖' : '✔'} {sccrSentence(sccr, short)}
        </p>
      ) : null}
      {sccr ? limiting : pending ? <p className="text-ink-soft">Checking the short-circuit rating…</p> : null}
      {heat ? (
        <p data-testid="sign-off-heat" className={heat.exceeded ? 'text-state-review' : 'text-state-signed'}>
          {heat.exceeded ? '◔' : '✔'} Inside the enclosure {heat.internalTempC.toFixed(1)} °C against a {heat.internalLimitC} °C limit
          {heat.exceeded && heat.cooling
            ? `: ${Math.round(heat.cooling.excessW)} W to remove (fan or air conditioner in the bill of materials?)`
            : ''}{' '}
          (IEC TR 60890 simplified).
        </p>
      ) : null}
      {checks?.controlPower.fitted?.adequate === false ? (
        <p className="text-state-review">
          ◔ The control transformer in the bill of materials is smaller than the {checks.controlPower.result?.sizeVa} VA needed.
        </p>
      ) : null}
    </>
  );
}
