// The sections of the panel submittal, in the order the PDF shows them: cover, load schedule, protection
// summary, one-lines, nameplate and feeder, motors at another voltage, SCCR worksheet, heat, control power,
// control-circuit conductors, motor connection cards and the cautions.
import { answerValueLabel, fieldLabel, starterTypeLabel } from '../../../shared/labels';
import type { LoadSelection } from '../../../shared/schemas/selection';
import { motorFeed, sourcesSummary } from '../../../shared/calc/other-sources';
import { sharedDriveOf } from '../../../shared/calc/shared-drive-one-line';
import { motorGroup } from '../../../shared/calc/group-circuits';
import type { LineName } from '../../../shared/calc/connections';
import { relayOf, relayWiringText } from '../../../shared/calc/overload';
import { perWindingText } from '../../../shared/calc/scpd';
import { motorLeadText, termination60Text, voltageDropText } from '../../../shared/calc/conductor';
import { unbalanceText } from '../../../shared/standards/nema-mg1-voltage-unbalance';
import { SCPD_WORDS } from '../../../shared/calc/scpd';
import type { SubmittalData } from './pdf-data';
import { COPPER, MARGIN, SLATE, fmt, pdfSafe, type Writer } from './pdf-writer';
import { drawOneLine, oneLineHeight } from './pdf-one-line';

export const SUBMITTAL_CAUTIONS = [
  'These results support the design of a qualified person and do not replace it; a qualified person verifies every value.',
  'Local codes, the authority having jurisdiction, and the listing and instructions of the equipment take precedence.',
  'De-energise and lock out before work.',
  'Check motor rotation before coupling the load.',
  'Never run a DC series motor unloaded.',
] as const;

function starterText(s: LoadSelection): string {
  return `${starterTypeLabel(s.starter.type)}${s.starter.nemaSize !== null ? ` size ${s.starter.nemaSize}` : ''}`;
}

const LINES: LineName[] = ['L1', 'L2', 'L3', 'A+', 'A-'];

/** The cover: job, panel, revision, site conditions, sign-off, and the cautions. */
export function coverPage(w: Writer, data: SubmittalData): void {
  const doc = w.doc;
  const { regular, bold } = w;
  doc.rect(0, 0, doc.page.width, 110).fill('#1e293b');
  doc.font(bold).fontSize(24).fillColor('#ffffff').text('Panel submittal', MARGIN, 40);
  doc.font(regular).fontSize(11).fillColor(COPPER).text(pdfSafe(data.shop.name), MARGIN, 74);
  doc.y = 140;
  w.kv([
    ['Job', `${data.job.number} - ${data.job.name}`],
    ['Customer', data.job.customer],
    ['Site', data.job.site],
    ['Panel', data.panel.name],
    ['Revision', data.panel.revision],
    ['Date', data.panel.date],
    ['Enclosure', `Type ${data.panel.enclosureType}`],
    ['Available fault current', data.job.availableFaultKa === null ? 'not given' : `${data.job.availableFaultKa} kA`],
    ['Ambient', `${data.job.ambientC} °C`],
    ['Code edition', data.job.codeEdition],
    ...(data.signOff
      ? [
          ['Signed off', `${data.signOff.revision} on ${data.signOff.date}${data.signOff.by ? ` by ${data.signOff.by}` : ''}`] as [
            string,
            string,
          ],
        ]
      : []),
  ]);
  w.sub('Cautions');
  for (const c of SUBMITTAL_CAUTIONS) w.para(`- ${c}`);
}

/** Load schedule. */
export function loadSchedule(w: Writer, data: SubmittalData): void {
  const doc = w.doc;
  doc.addPage();
  w.heading('Load schedule');
  w.table(
    ['Tag', 'Description', 'hp', 'V', 'FLC A', 'FLA A', 'Starter', 'Branch SCPD', 'OL max A', 'Conductor'],
    [0.08, 0.17, 0.06, 0.06, 0.07, 0.07, 0.13, 0.14, 0.08, 0.14],
    data.selections.map((s) => [
      s.tag,
      s.description ?? '',
      s.hp === null ? '-' : String(s.hp),
      String(s.volts),
      fmt(s.flcAmps),
      fmt(s.flaAmps),
      starterText(s),
      `${s.scpd.ratingAmps} A ${SCPD_WORDS[s.scpd.type]}`,
      s.overload.providedByDrive ? 'by drive' : fmt(s.overload.maxSettingAmps, 2),
      `${s.conductor.size} ${s.conductor.material} ${s.conductor.tempRatingC} °C`,
    ]),
  );
}

/** Protection summary with the basis of each choice. */
export function protectionSummary(w: Writer, data: SubmittalData): void {
  w.heading('Protection summary');
  for (const s of data.selections) {
    w.sub(`${s.tag}${s.description ? ` - ${s.description}` : ''}`);
    w.table(
      ['Item', 'Choice', 'Basis'],
      [0.18, 0.32, 0.5],
      [
        ['Full-load current', `${fmt(s.flcAmps)} A`, s.flcSource],
        ['Starter', starterText(s), s.starter.basis],
        [
          'Branch SCPD',
          `${s.scpd.ratingAmps} A ${SCPD_WORDS[s.scpd.type]} (max ${s.scpd.maxPercent} % = ${fmt(s.scpd.computedMaxAmps)} A)${perWindingText(s) ? `; ${perWindingText(s)}` : ''}`,
          s.scpd.perWinding ? `${s.scpd.basis}; per half-winding: ${s.scpd.perWinding.basis}` : s.scpd.basis,
        ],
        [
          'Overload',
          s.overload.providedByDrive
            ? 'drive electronic overload'
            : `class ${s.overload.tripClass}, max ${fmt(s.overload.maxSettingAmps, 2)} A (${s.overload.maxPercent} %)${relayWiringText(s) ? `; ${relayWiringText(s)}` : ''}`,
          relayWiringText(s) ? `${s.overload.basis}; relay: ${relayOf(s).basis}` : s.overload.basis,
        ],
        [
          'Conductor',
          `${s.conductor.size} ${s.conductor.material}, ${s.conductor.ampacity} A (min ${fmt(s.conductor.minAmpacity)} A)${termination60Text(s) ? `; ${termination60Text(s)}` : ''}${motorLeadText(s) ? `; ${motorLeadText(s)}` : ''}${voltageDropText(s) ? `; ${voltageDropText(s)}` : ''}`,
          s.conductor.motorLeads ? `line side: ${s.conductor.basis}; ${s.conductor.motorLeads.basis}` : s.conductor.basis,
        ],
        ...(s.unbalance ? [['Voltage unbalance', unbalanceText(s.unbalance), s.unbalance.basis]] : []),
        [
          'Disconnect',
          `>= ${fmt(s.disconnect.minAmps)} A${s.disconnect.minHp !== null ? `, >= ${s.disconnect.minHp} hp` : ''}`,
          s.disconnect.basis,
        ],
      ],
    );
    for (const a of s.assumed)
      w.para(`Assumed input: ${fieldLabel(a.field) ?? a.field} = ${answerValueLabel(a.field, a.assumed)} (${a.note})`, 8);
    for (const c of s.cautions) w.para(`Caution: ${c}`, 8);
  }
}

/** One-lines (the heading kept with the first diagram). */
export function oneLineDiagrams(w: Writer, data: SubmittalData): void {
  const shareOf = (tag: string) => ({ drive: sharedDriveOf(data.rollup, tag), group: motorGroup(data.rollup, tag) });
  const first = data.selections[0];
  if (first) w.ensure(oneLineHeight(first, motorFeed(data.rollup, first.tag), shareOf(first.tag)) + 90);
  w.heading('One-line diagrams');
  for (const s of data.selections) drawOneLine(w, s, motorFeed(data.rollup, s.tag), shareOf(s.tag));
}

/** Nameplate and feeder. */
export function nameplateAndFeeder(w: Writer, data: SubmittalData): void {
  w.heading('Panel nameplate and feeder');
  w.table(
    ['Marking', 'Value', 'Basis'],
    [0.25, 0.35, 0.4],
    data.nameplate.lines.map((l) => [l.label, l.value, l.basis]),
  );
  const f = data.nameplate.feeder;
  w.table(
    ['Item', 'Value', 'Basis'],
    [0.25, 0.35, 0.4],
    [
      ['Feeder conductor', `${f.conductor.size} (min ${fmt(f.conductor.minAmpacity)} A)`, f.conductor.basis],
      ['Supply protective device', `max ${f.supplyProtection.maxAmps} A`, f.supplyProtection.basis],
      ['Main disconnect', `${f.mainDisconnect.sizeAmps} A (min ${fmt(f.mainDisconnect.minAmps, 2)} A)`, f.mainDisconnect.basis],
    ],
  );
  for (const warn of data.nameplate.warnings) w.para(`Note: ${warn}`, 8);
}

/** Motors at another voltage than the supply. */
export function otherVoltages(w: Writer, data: SubmittalData): void {
  const other = sourcesSummary(data.rollup);
  if (other.lines.length > 0) {
    w.heading('Motors at another voltage');
    for (const line of other.lines) w.para(line);
    for (const src of other.sources) {
      w.table(
        ['Item', 'Value', 'Basis'],
        [0.25, 0.35, 0.4],
        [
          [
            src.tag,
            src.kind === 'transformer'
              ? `${src.kva} kVA ${src.primaryVolts}-${src.secondaryLabel} (load ${fmt(src.loadKva, 2)} kVA)`
              : `${src.secondaryLabel}, >= ${fmt(src.secondaryAmps, 2)} A`,
            src.basis,
          ],
          [
            'Primary protection',
            `${src.primaryProtection.ratingAmps} A (limit ${fmt(src.primaryProtection.maxAmps, 2)} A)`,
            src.primaryProtection.basis,
          ],
          ...(src.secondaryProtection
            ? [
                [
                  'Secondary protection',
                  `${src.secondaryProtection.ratingAmps} A (limit ${fmt(src.secondaryProtection.maxAmps, 2)} A)`,
                  src.secondaryProtection.basis,
                ],
              ]
            : []),
        ],
      );
    }
  }
}

/** SCCR worksheet. */
export function sccrWorksheet(w: Writer, data: SubmittalData): void {
  w.heading('Short-circuit current rating worksheet');
  w.para(data.sccr.basis, 8);
  w.table(
    ['Location', 'Component', 'Type', 'Rating kA', 'Source', 'Basis'],
    [0.1, 0.2, 0.13, 0.09, 0.12, 0.36],
    data.sccr.rows.map((r) => [
      r.location,
      `${r.code} ${r.description}${r.limiting ? ' (LIMITING)' : ''}`,
      r.category,
      fmt(r.ratingKa, 2),
      r.source,
      r.basis,
    ]),
    (i) => data.sccr.rows[i].limiting,
  );
  w.para(
    `Panel SCCR: ${data.sccr.panelSccrKa === null ? 'not established' : `${fmt(data.sccr.panelSccrKa, 2)} kA`}. ` +
      `Available fault current: ${data.sccr.availableFaultKa === null ? 'not given' : `${data.sccr.availableFaultKa} kA`}. ` +
      `Verdict: ${data.sccr.verdict} (NEC 409.22).`,
    10,
  );
  if (data.signOff?.acknowledged) {
    const a = data.signOff.acknowledged;
    w.para(`Signed off ${data.signOff.revision} with this rating. Finding: ${a.finding}. Reason given by ${a.by}: ${a.reason}`, 10);
  }
  for (const n of data.sccr.notes) w.para(n, 8);
  if (data.sccr.waysOut.length > 0) {
    w.sub('Ways out');
    w.table(
      ['Change', 'Resulting SCCR kA', 'Resolves', 'Cost difference'],
      [0.55, 0.15, 0.1, 0.2],
      data.sccr.waysOut.map((o) => [
        o.description,
        fmt(o.resultingSccrKa, 2),
        o.resolves ? 'yes' : 'no',
        o.costDifference === null ? '-' : fmt(o.costDifference, 2),
      ]),
    );
  }
}

/** Heat calculation. */
export function heatCalculation(w: Writer, data: SubmittalData): void {
  const doc = w.doc;
  const { regular } = w;
  const h = data.heat;
  w.heading('Heat calculation');
  w.para(h.basis, 8);
  w.table(
    ['Face', 'Area m²', 'Factor b', 'Effective m²'],
    [0.25, 0.25, 0.25, 0.25],
    h.faces.map((x) => [x.face, fmt(x.areaM2, 3), String(x.factor), fmt(x.effectiveM2, 3)]),
  );
  w.table(
    ['Bucket', 'Part', 'Loss W', 'Basis'],
    [0.15, 0.3, 0.12, 0.43],
    h.sources.map((x) => [x.bucketTag ?? 'Panel', `${x.code} ${x.description}`, fmt(x.watts), x.basis]),
  );
  w.sub('Heat by bucket');
  const maxW = Math.max(1, ...h.byBucket.map((b) => b.watts));
  for (const b of h.byBucket) {
    w.ensure(16);
    const y = doc.y;
    doc
      .font(regular)
      .fontSize(8)
      .fillColor(SLATE)
      .text(pdfSafe(b.bucketTag), MARGIN, y + 2, { width: 90 });
    doc.rect(MARGIN + 95, y, Math.max(1, (b.watts / maxW) * (w.width - 170)), 10).fill(COPPER);
    doc
      .font(regular)
      .fontSize(8)
      .fillColor(SLATE)
      .text(`${fmt(b.watts)} W`, MARGIN + w.width - 70, y + 2, { width: 70, align: 'right' });
    doc.x = MARGIN;
    doc.y = y + 14;
  }
  w.kv([
    ['Total losses', `${fmt(h.totalLossW)} W`],
    ['Effective cooling surface Ae', `${fmt(h.aeM2, 3)} m²`],
    ['Temperature rise', `${fmt(h.deltaTK)} K = P / (k x Ae), k = ${h.k} W/(m² K)`],
    ['Internal temperature', `${fmt(h.internalTempC)} °C at ${h.ambientC} °C ambient (limit ${h.internalLimitC} °C)`],
    ['Verdict', h.exceeded ? 'limit exceeded: cooling needed' : 'within the limit'],
    ...(h.cooling
      ? ([
          ['Excess heat', `${fmt(h.cooling.excessW)} W (${h.cooling.basis})`],
          [
            'Filter fan',
            h.cooling.fan
              ? `${fmt(h.cooling.fan.cfm)} cfm (${fmt(h.cooling.fan.m3h)} m³/h); ${h.cooling.fan.basis}`
              : 'a fan cannot cool below the ambient',
          ],
          ['Air conditioner', `${fmt(h.cooling.airConditionerW)} W`],
        ] as Array<[string, string]>)
      : []),
  ]);
  for (const n of h.notes) w.para(n, 8);
}

/** Control power transformer. */
export function controlPower(w: Writer, data: SubmittalData): void {
  const cp = data.controlPower;
  w.heading('Control power transformer');
  w.kv([
    ['Sealed VA', fmt(cp.sealedVa)],
    ['Inrush VA', fmt(cp.inrushVa)],
    ['Selection VA = sqrt(sealed² + inrush²)', fmt(cp.selectionVa)],
    ['Transformer size', `${cp.sizeVa} VA (inrush capacity ${cp.inrushCapacityVa} VA at 40 % PF: ${cp.inrushOk ? 'OK' : 'NOT OK'})`],
    [
      'Primary protection',
      `${cp.primary.ratingAmps} A (${fmt(cp.primary.currentA, 3)} A x ${cp.primary.maxPercent} % = ${fmt(cp.primary.maxAmps, 3)} A) - ${cp.primary.basis}`,
    ],
    [
      'Secondary protection',
      `${cp.secondary.ratingAmps} A (${fmt(cp.secondary.currentA, 3)} A x ${cp.secondary.maxPercent} % = ${fmt(cp.secondary.maxAmps, 3)} A) - ${cp.secondary.basis}`,
    ],
  ]);
  for (const n of [...cp.basis, ...cp.notes]) w.para(n, 8);
}

/** Control-circuit conductors (430.72(A), (B), Table 430.72(B)). */
export function controlConductors(w: Writer, data: SubmittalData): void {
  const cc = data.controlConductors;
  if (cc) {
    w.heading('Control-circuit conductors');
    w.table(
      ['Bucket', 'Conductor', 'Protected by', 'Table 430.72(B)', 'Max (A)', 'Verdict'],
      [0.14, 0.14, 0.3, 0.16, 0.1, 0.16],
      cc.rows.map((r) => [
        r.bucket,
        `${r.conductor} ${r.material === 'cu' ? 'Cu' : 'Al'}`,
        `${r.device.kind}${r.device.amps !== null ? ` ${r.device.amps} A` : ''}`,
        `column ${r.column}`,
        r.maxAmps === null ? '-' : String(r.maxAmps),
        r.ok === null ? 'not checked' : r.ok ? 'OK' : 'TOO SMALL',
      ]),
    );
    for (const f of cc.findings) w.para(`- ${f}`, 9);
    w.para(cc.basis, 8);
  }
}

/** Motor connection cards. */
export function connectionCards(w: Writer, data: SubmittalData): void {
  w.heading('Motor connection cards');
  for (const { tag, card } of data.connectionCards) {
    w.sub(`${tag}: ${card.title}`);
    for (const st of card.steps) {
      const lines = LINES.filter((l) => st.lineGroups[l]);
      w.table(
        [st.label, ...lines],
        [0.25, ...lines.map(() => 0.75 / lines.length)],
        [
          ['Leads', ...lines.map((l) => st.lineGroups[l]!.join(', '))],
          ...(st.joined.length ? [['Join', st.joined.map((g) => g.join('-')).join('  '), ...lines.slice(1).map(() => '')]] : []),
          ...(st.insulated.length ? [['Insulate', st.insulated.join(', '), ...lines.slice(1).map(() => '')]] : []),
        ],
      );
    }
    w.para(`To reverse: ${card.reverse}`);
    for (const c of card.cautions) w.para(`- ${c}`, 8);
    w.para(`${card.basis}. ${card.notes.join(' ')}`, 8);
  }
}

/** The cautions again, closing the document. */
export function closingCautions(w: Writer): void {
  w.heading('Cautions');
  for (const c of SUBMITTAL_CAUTIONS) w.para(`- ${c}`, 10);
}
