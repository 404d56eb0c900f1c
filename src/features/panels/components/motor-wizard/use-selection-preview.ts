import { useEffect, useState } from 'react';
import { LoadSchema, type LoadInput } from '../../../../../shared/schemas/load';
import type { LoadSelection } from '../../../../../shared/schemas/selection';
import type { PanelDetail } from '../../../../../shared/schemas/panel';
import { jobSupply } from '../../../../../shared/schemas/job';
import { fieldLabel } from '../../../../../shared/labels';
import type { CodeEdition } from '../../../../../shared/standards/code-edition';
import { browserSelector } from '../../../../lib/selector';
import { cleanAnswers as clean } from '../../model/motor-answers';

export interface SelectionPreviewState {
  sel: LoadSelection | null;
  error: string | null;
}

/** The preview's "what is missing" line: each answer by its label, with the plain sentence. */
export function missingAnswers(issues: ReadonlyArray<{ path: PropertyKey[]; message: string }>): string {
  const parts = issues.slice(0, 3).map((i) => {
    const key = i.path.map(String).join('.');
    const name = key === 'hp' || key === 'kw' ? 'Horsepower or kW' : (fieldLabel(key) ?? key);
    return `${name}: ${i.message}`;
  });
  return [...new Set(parts)].join(' ') + (issues.length > 3 ? ' …' : '');
}

/** Live preview: the same engine as the server, in the browser, as the answers change. */
export function useSelectionPreview(p: PanelDetail, values: Record<string, unknown>): SelectionPreviewState {
  const [preview, setPreview] = useState<SelectionPreviewState>({ sel: null, error: null });
  const valuesKey = JSON.stringify(values);

  // biome-ignore lint/correctness/useExhaustiveDependencies: keyed on the answers' JSON (valuesKey), as the form hands over a new values object on every render
  useEffect(() => {
    const t = setTimeout(() => {
      const parsed = LoadSchema.safeParse(clean(values));
      if (!parsed.success) {
        setPreview((x) => ({ sel: x.sel, error: `Complete the answers to see the selection: ${missingAnswers(parsed.error.issues)}` }));
        return;
      }
      browserSelector((p.job.codeEdition === '2020' ? '2020' : '2023') as CodeEdition)
        .selectLoad(clean(values) as LoadInput, jobSupply({ ...p.job, terminationsListed75C: p.terminationsListed75C }))
        .then((sel) => setPreview({ sel, error: null }))
        .catch((e: Error) => setPreview({ sel: null, error: e.message }));
    }, 150);
    return () => clearTimeout(t);
  }, [valuesKey, p.job.codeEdition]);

  return preview;
}
