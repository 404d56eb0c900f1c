import { useEffect, useMemo, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import type { LoadInput } from '../../../../../shared/schemas/load';
import type { LoadView, PanelDetail } from '../../../../../shared/schemas/panel';
import { ApiError } from '../../../../lib/api-client';
import { useSaveLoad } from '../../api/panels';
import { cleanAnswers as clean, motorResolver, newMotorAnswers } from '../../model/motor-answers';
import { firstStepWithError, STEPS, type FieldMessages } from './steps';
import { useSelectionPreview } from './use-selection-preview';

/**
 * The wizard's state: the form (a saved motor's answers or a new motor's defaults), the step shown,
 * the live preview, and the save, with the server's field errors put back on their fields.
 */
export function useMotorWizard({
  panelId,
  panel: p,
  existing,
  onSaved,
}: {
  panelId: number;
  panel: PanelDetail;
  existing: LoadView | undefined;
  onSaved: () => void;
}) {
  const save = useSaveLoad(panelId);
  const [step, setStep] = useState(0);
  const form = useForm<LoadInput>({
    resolver: motorResolver,
    defaultValues: existing ? (existing.answers as LoadInput) : newMotorAnswers(),
    mode: 'onChange',
  });
  const { register, handleSubmit, formState, control, setError } = form;
  const values = useWatch({ control }) as Record<string, unknown>;
  const preview = useSelectionPreview(p, values);

  const serverErrors = useMemo(() => (save.error instanceof ApiError ? save.error.fieldIssues : []), [save.error]);
  useEffect(() => {
    for (const i of serverErrors) {
      const name = i.path.replace(/^body\.answers\./, '');
      setError(name as keyof LoadInput, { message: i.message });
    }
  }, [serverErrors, setError]);

  const errors = formState.errors as FieldMessages;
  const onSubmit = handleSubmit(
    (v) =>
      save.mutate(
        { loadId: existing?.id, answers: clean(v as Record<string, unknown>), version: existing?.version },
        { onSuccess: onSaved },
      ),
    (errs) => setStep(firstStepWithError(errs)),
  );
  // Enter in a field submits the form through its first submit button, "Next": it moves to the next
  // step. Only the last step's Enter, or a click on the save button, saves the motor.
  const onFormSubmit = (ev: React.FormEvent<HTMLFormElement>) => {
    const submitter = (ev.nativeEvent as SubmitEvent).submitter as HTMLElement | null;
    if (step < STEPS.length - 1 && submitter?.dataset.action !== 'save') {
      ev.preventDefault();
      setStep((s) => s + 1);
      return;
    }
    void onSubmit(ev);
  };

  return { register, errors, values, step, setStep, preview, save, onFormSubmit };
}
