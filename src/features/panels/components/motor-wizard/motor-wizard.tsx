import type { PanelDetail } from '../../../../../shared/schemas/panel';
import { Button } from '../../../../components/ui/button';
import { ErrorNote } from '../../../../components/ui/feedback';
import { ApiError } from '../../../../lib/api-client';
import { DutyStep } from './duty-step';
import { NameplateStep } from './nameplate-step';
import { ProtectionStep } from './protection-step';
import { SelectionPreview } from './selection-preview';
import { SiteStep } from './site-step';
import { StepNav } from './step-nav';
import { STEPS } from './steps';
import { useMotorWizard } from './use-motor-wizard';

/**
 * A motor's answers, step by step (nameplate, duty, site and hazards, protection), beside the live
 * selection. `loadId` names the saved motor to edit; without it the wizard adds a new motor.
 */
export function MotorWizard({
  panelId,
  panel: p,
  loadId,
  onDone,
}: {
  panelId: number;
  panel: PanelDetail;
  loadId: number | undefined;
  /** after a save, and on Cancel */
  onDone: () => void;
}) {
  const existing = loadId !== undefined ? p.loads.find((l) => l.id === loadId) : undefined;
  const {
    register,
    errors: e,
    values,
    step,
    setStep,
    preview,
    save,
    onFormSubmit,
  } = useMotorWizard({
    panelId,
    panel: p,
    existing,
    onSaved: onDone,
  });
  const stepName = STEPS[step];
  return (
    <div className="grid grid-cols-1 gap-5 lg:grid-cols-[minmax(0,1fr)_430px]">
      <form onSubmit={onFormSubmit} noValidate className="rounded border border-line bg-panel" aria-label="Motor wizard">
        <div className="flex items-center justify-between border-b border-line px-4 py-2">
          <h2 className="text-lg font-semibold">{existing ? `Motor ${existing.tag}` : 'New motor'}</h2>
          <StepNav step={step} errors={e} onStep={setStep} />
        </div>
        <div className="grid grid-cols-2 gap-4 p-4 md:grid-cols-3">
          {stepName === 'Nameplate' ? <NameplateStep register={register} errors={e} values={values} /> : null}
          {stepName === 'Duty' ? <DutyStep register={register} errors={e} values={values} /> : null}
          {stepName === 'Site & hazards' ? (
            <SiteStep register={register} errors={e} values={values} supplyVolts={p.job.supplyVolts} />
          ) : null}
          {stepName === 'Protection' ? <ProtectionStep register={register} errors={e} /> : null}
        </div>
        <div className="flex items-center gap-2 border-t border-line px-4 py-3">
          <Button variant="secondary" disabled={step === 0} onClick={() => setStep((s) => s - 1)}>
            ‹ Back
          </Button>
          {step < STEPS.length - 1 ? (
            <Button type="submit" variant="secondary" data-action="next">
              Next ›
            </Button>
          ) : null}
          <Button type="submit" data-action="save" className="ml-auto" disabled={save.isPending}>
            {save.isPending ? 'Saving…' : existing ? 'Save motor' : 'Add motor'}
          </Button>
          <Button variant="ghost" onClick={() => onDone()}>
            Cancel
          </Button>
        </div>
        {save.error && !(save.error instanceof ApiError && save.error.fieldIssues.length) ? (
          <div className="px-4 pb-3">
            <ErrorNote error={save.error} />
          </div>
        ) : null}
      </form>
      <SelectionPreview preview={preview} codeEdition={p.job.codeEdition} panelId={panelId} existing={existing} />
    </div>
  );
}
