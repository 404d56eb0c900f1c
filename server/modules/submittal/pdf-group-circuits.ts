// The submittal's section on motors sharing one branch circuit (NEC 430.53): each group's path, device,
// conductor to the taps, the taps and each motor's overload, or the reason the group is refused.
import type { SubmittalData } from './pdf-data';
import type { Writer } from './pdf-writer';

const plain = (t: string) => t.replace(/ — /g, ' - ');

export function groupCircuitsSection(w: Writer, data: SubmittalData): void {
  const groups = data.rollup.groups ?? [];
  if (groups.length === 0) return;
  w.heading('Motors on one branch circuit');
  for (const g of groups) {
    w.sub(`${g.group}: ${g.motors.join(', ')} at ${g.volts} V`);
    if (g.device && g.path)
      w.para(
        `430.53(${g.path}) applies: one ${g.device.ratingAmps} A ${g.device.type.replace(/-/g, ' ')} for the group. ${g.device.basis}.`,
      );
    else w.para(`REFUSED: ${plain(g.refusal ?? '')}. Each motor keeps its own branch device.`);
    if (g.conductor) w.para(`Group conductor to the taps: ${g.conductor.size} (${g.conductor.ampacity} A). ${g.conductor.basis}.`, 8);
    for (const p of g.paths)
      w.para(
        `(${p.path}) ${p.allowed ? 'allowed' : 'not allowed'}: ${p.conditions}${p.ratingAmps !== null ? ` - ${p.ratingAmps} A` : ''}${p.reasons.length ? ` - ${p.reasons.join('; ')}` : ''}`,
        8,
      );
    if (g.taps.length)
      w.table(
        ['Motor', 'FLC (A)', 'Tap', 'Rule', 'Overload max (A)'],
        [0.2, 0.15, 0.25, 0.15, 0.25],
        g.taps.map((t) => [
          t.tag,
          String(t.flcAmps),
          t.size,
          `430.53(${t.rule})`,
          String(g.overloads.find((o) => o.tag === t.tag)?.maxSettingAmps ?? '-'),
        ]),
      );
    for (const v of g.verify) w.para(`- Verify: ${v}`, 8);
  }
}
