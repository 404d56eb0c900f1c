import { describe, expect, it } from 'vitest';
import { PassThrough } from 'node:stream';
import { writeSubmittalPdf, type SubmittalData, type SubmittalPdfOptions } from '../../../server/modules/submittal/pdf';
import { calculatePanelSccr } from '../../../shared/calc/sccr';
import { calculateHeat } from '../../../shared/calc/heat';
import { sizeControlTransformer } from '../../../shared/calc/control-power';
import { panelNameplate } from '../../../shared/calc/nameplate';
import { connectionCard } from '../../../shared/calc/connections';
import { blowerVfd, conveyorFvr, pumpFvnr, rollup, selection } from './fixtures';
import { extractPdfText } from './pdf-text';
import { backplateLayout } from '../../../shared/calc/layout/backplate';
import { layoutSheetSvg } from '../../../shared/drawings/svg-layout';

function data(): SubmittalData {
  const sccr = calculatePanelSccr({
    feeder: [{ code: 'PDB-1', category: 'power-distribution-block', description: 'distribution block', sccrKa: 50 }],
    buckets: [
      { tag: 'P-101', hp: 10, components: [{ code: 'C-09', category: 'contactor', description: 'contactor' }] },
      { tag: 'CV-201', hp: 25, components: [{ code: 'C-32', category: 'contactor', description: 'contactor', sccrKa: 65 }] },
    ],
    availableFaultKa: 22,
  });
  return {
    job: {
      number: 'J-2041',
      name: 'Clarifier upgrade',
      customer: 'Cedar Flats water works',
      site: 'Plant 2',
      availableFaultKa: 22,
      ambientC: 30,
      codeEdition: 'NEC 2023',
    },
    panel: { name: 'MCP-1', revision: 'R1', date: '2025-03-14', enclosureType: '12' },
    shop: { name: 'Cedar Flats Panel Works', address: '12 Foundry Lane, Cedar Flats', drawingNumberScheme: '{job}-{panel}-{sheet:2}' },
    selections: [pumpFvnr, conveyorFvr, blowerVfd],
    rollup,
    sccr,
    heat: calculateHeat({
      enclosure: { heightM: 2, widthM: 0.8, depthM: 0.6, mounting: 'wall-mounted' },
      sources: [
        { bucketTag: 'B-301', code: 'VFD-40', description: 'drive', category: 'vfd', heatLossW: 600, ratedAmps: 40, loadAmps: 30 },
        { bucketTag: 'P-101', code: 'C-09', description: 'contactor', category: 'contactor', heatLossW: 90 },
      ],
      ambientC: 30,
    }),
    controlPower: sizeControlTransformer({
      loads: [{ description: 'coil', kind: 'coil', qty: 4, sealedVa: 45, inrushVa: 150 }],
      primaryVolts: 480,
      secondaryVolts: 120,
    }),
    nameplate: panelNameplate({
      rollup,
      supply: { volts: 480, phases: 3, hz: 60 },
      sccrKa: sccr.panelSccrKa,
      enclosureType: '12',
      shopName: 'Cedar Flats Panel Works',
    }),
    connectionCards: [
      { tag: 'P-101', card: connectionCard({ motor: 'three-phase', leads: 9, winding: 'wye', voltage: 'high' }) },
      { tag: 'DC-1', card: connectionCard({ motor: 'dc', field: 'series' }) },
    ],
  };
}

async function render(opts: SubmittalPdfOptions, d: SubmittalData = data()): Promise<{ buf: Buffer; font: string }> {
  const stream = new PassThrough();
  const chunks: Buffer[] = [];
  stream.on('data', (c: Buffer) => chunks.push(c));
  const { font } = await writeSubmittalPdf(d, stream, opts);
  return { buf: Buffer.concat(chunks), font };
}

const pageCount = (pdf: Buffer) => (pdf.toString('latin1').match(/\/Type \/Page\b(?!s)/g) ?? []).length;

describe('PDF submittal', () => {
  for (const fontChoice of ['barlow', 'helvetica'] as const) {
    it(`writes a readable document (${fontChoice})`, async () => {
      const { buf, font } = await render({ compress: false, font: fontChoice });
      expect(buf.subarray(0, 5).toString()).toBe('%PDF-');
      expect(font).toBe(fontChoice === 'barlow' ? 'Barlow' : 'Helvetica');
      if (fontChoice === 'barlow') expect(buf.toString('latin1')).toMatch(/\/BaseFont \/[A-Z]{6}\+Barlow/);
      const text = extractPdfText(buf);
      for (const s of [
        'Panel submittal',
        'J-2041 - Clarifier upgrade',
        'MCP-1',
        'R1',
        '2025-03-14',
        'Load schedule',
        'P-101',
        '25 A dual-element fuses',
        'NEC 2023 430.52(C)(1)',
        'Protection summary',
        'One-line diagrams',
        'Short-circuit current rating worksheet',
        'assumed for an unmarked component: UL 508A Table SB4.1',
        'Panel SCCR: 5 kA',
        'Verdict: below-available',
        'Heat calculation',
        'IEC TR 60890 simplified method',
        'Control power transformer',
        '200 VA',
        '430.72(C)(4)',
        'Motor connection cards',
        'T4-T7 T5-T8 T6-T9',
        'Never run a DC series motor unloaded.',
        'Check motor rotation before coupling the load.',
        'De-energise and lock out before work.',
        'the authority having jurisdiction',
        'a qualified person verifies every value',
      ]) {
        expect(text, s).toContain(s);
      }
      expect(text).not.toContain('?'); // every character within the font's range
    });
  }
  it('shows a wye-delta overload relay as wired and the site voltage unbalance', async () => {
    // 60 hp blower, nameplate 70 A, SF 1.15: line limit 87.5 A (NEC 2023 430.32(A)(1)); in the delta windings
    // 70/√3 = 40.41 A set, 87.5/√3 = 50.52 A max (common practice); 1.96 % unbalance -> 0.952 × 60 hp = 57.12 hp
    const blower = selection({
      tag: 'K-301',
      description: 'Blower',
      hp: 60,
      flcAmps: 77,
      flaAmps: 70,
      starter: { type: 'wye-delta', nemaSize: null },
      overload: {
        maxSettingAmps: 87.5,
        maxPercent: 125,
        relay: {
          share: 1 / Math.sqrt(3),
          count: 1,
          settingAmps: 40.41,
          maxAmps: 50.52,
          note: null,
          basis: 'NEC 2023 430.32(A)(1) limit x 1/sqrt(3); relay position: common practice',
        },
      },
      unbalance: {
        percent: 1.96,
        deratingFactor: 0.952,
        deratedHp: 57.12,
        basis: 'NEMA MG 1 14.35, Figure 14-1 (curve values from memory)',
      },
    });
    const { buf } = await render({ compress: false }, { ...data(), selections: [blower] });
    const text = extractPdfText(buf);
    for (const s of [
      '1 relay in the delta windings: set 40.41 A, max 50.52 A each',
      'Voltage unbalance',
      '1.96 %: derate to 0.952 × rating = 57.12 hp',
      'NEMA MG 1 14.35',
    ]) {
      expect(text, s).toContain(s);
    }
    expect(text).not.toContain('?');
  });

  it('states a sign-off that acknowledged a rating below the site fault current (NEC 409.22), and says nothing of one for a draft', async () => {
    const acknowledged = {
      finding: 'Panel SCCR 5 kA is below the 22 kA available at the site (NEC 409.22)',
      by: 'Ines Markham',
      reason: 'Class J fuses upstream per the fault study',
    };
    const { buf } = await render({ compress: false }, { ...data(), signOff: { revision: 'R1', date: '2025-03-20', acknowledged } });
    const text = extractPdfText(buf);
    for (const s of [
      'Signed off',
      'R1 on 2025-03-20',
      'Signed off R1 with this rating. Finding: Panel SCCR 5 kA is below the 22 kA available at the site (NEC 409.22).',
      'Reason given by Ines Markham: Class J fuses upstream per the fault study',
    ]) {
      expect(text, s).toContain(s);
    }
    const draft = extractPdfText((await render({ compress: false })).buf);
    expect(draft).not.toContain('with this rating');
    expect(draft).not.toContain('R1 on');
  });

  it('puts the title block on every page: shop, job, panel, revision, drawing number, page n of N, sign-off', async () => {
    const { buf } = await render({ compress: false, font: 'helvetica' });
    const text = extractPdfText(buf);
    const pages = pageCount(buf);
    expect(pages).toBeGreaterThan(4);
    // on the cover, on the nameplate (Manufacturer, NEC 2023 409.110(1)) and in each page's title block
    expect(text.split('Cedar Flats Panel Works').length - 1).toBe(pages + 2);
    for (let n = 1; n <= pages; n++) {
      expect(text, `page ${n}`).toContain(`Page ${n} of ${pages}`);
      // scheme {job}-{panel}-{sheet:2}: the sheet is the page, two digits
      expect(text, `drawing ${n}`).toContain(`J-2041-MCP-1-${String(n).padStart(2, '0')}`);
    }
    expect(text).not.toContain(`Page ${pages + 1} of`);
    expect(text.split('Not signed off').length - 1).toBe(pages);
    expect(text).not.toContain('[Shop name]');
    const signed = extractPdfText(
      (
        await render(
          { compress: false, font: 'helvetica' },
          { ...data(), signOff: { revision: 'R1', date: '2025-03-20', by: 'Ines Markham', acknowledged: null } },
        )
      ).buf,
    );
    expect(signed).toContain('R1 on 2025-03-20 by Ines Markham');
    expect(signed.split('Ines Markham').length - 1).toBeGreaterThanOrEqual(pages);
    expect(signed).not.toContain('Not signed off');
  });

  it('numbers the drawings by the shop scheme with the revision', async () => {
    const d = {
      ...data(),
      panel: { ...data().panel, revisionCode: 'R3' },
      shop: { ...data().shop, drawingNumberScheme: 'CF/{job}/{rev}/{sheet:3}' },
    };
    const text = extractPdfText((await render({ compress: false, font: 'helvetica' }, d)).buf);
    expect(text).toContain('CF/J-2041/R3/001');
    expect(text).toContain('CF/J-2041/R3/002');
  });

  it('draws the one-lines with lines and symbols, not text arrows', async () => {
    const { buf } = await render({ compress: false, font: 'helvetica' });
    const text = extractPdfText(buf);
    expect(text).not.toContain('->');
    // the labels of the on-screen one-line, beside the symbols (P-101: 25 A dual-element fuses, FVNR size 1)
    for (const s of [
      'Feeder bus',
      'Disconnect',
      '25 A dual-element fuses',
      'Contactor, NEMA size 1',
      'Reversing contactors',
      'Variable-frequency drive',
      'Overload, class',
    ])
      expect(text, s).toContain(s);
    // each motor is a circle: four Bézier curves in the content (tables and the title block draw none)
    const curves = (buf.toString('latin1').match(/ c\n/g) ?? []).length;
    expect(curves).toBeGreaterThanOrEqual(4 * data().selections.length);
  });

  it('embeds the shop logo once however many pages show it', async () => {
    // a 1 x 1 px PNG
    const png = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==', 'base64');
    const { buf } = await render({ compress: false, font: 'helvetica' }, { ...data(), shop: { ...data().shop, logo: png } });
    // one image object (with its transparency mask), drawn on every page
    expect((buf.toString('latin1').match(/\/Subtype \/Image/g) ?? []).length).toBe(2);
    expect((buf.toString('latin1').match(/\/SMask \d+ 0 R/g) ?? []).length).toBe(1);
    expect((buf.toString('latin1').match(/\/I1 Do/g) ?? []).length).toBe(pageCount(buf));
    expect(buf.toString('latin1')).not.toContain('/I2 Do');
    // an unreadable logo leaves the name alone instead of failing the submittal
    const broken = await render(
      { compress: false, font: 'helvetica' },
      { ...data(), shop: { ...data().shop, logo: Buffer.from('not an image') } },
    );
    expect(extractPdfText(broken.buf)).toContain('Cedar Flats Panel Works');
  });

  it('compresses by default', async () => {
    const { buf } = await render({});
    expect(buf.toString('latin1')).toContain('/FlateDecode');
  });
});

describe('PDF submittal: motors at another voltage', () => {
  it('names the transformer and its protection, and the motor fed from outside the panel', async () => {
    const d = data();
    d.rollup = {
      ...rollup,
      otherSources: [
        {
          kind: 'transformer',
          tag: 'T1',
          description: '7.5 kVA transformer 480-240/120 V single-phase',
          phases: 1,
          primaryVolts: 480,
          secondaryVolts: 240,
          secondaryLabel: '240/120 V single-phase',
          loadKva: 5.4,
          kva: 7.5,
          secondaryAmps: 31.25,
          primaryAmps: 15.63,
          // NEC 2023 Table 450.3(B): 250 % × 15.63 A → 35 A; 125 % × 31.25 A → 40 A (Note 1)
          primaryProtection: {
            method: 'primary-and-secondary',
            percent: 250,
            maxAmps: 39.08,
            ratingAmps: 35,
            basis: 'NEC 2023 Table 450.3(B) primary',
          },
          secondaryProtection: {
            method: 'primary-and-secondary',
            percent: 125,
            maxAmps: 39.06,
            ratingAmps: 40,
            basis: 'NEC 2023 Table 450.3(B) secondary',
          },
          motors: [
            { tag: 'F-1', supply: 'ac1', volts: 230, amps: 10, circuitVolts: 240 },
            { tag: 'F-2', supply: 'ac1', volts: 230, amps: 10, circuitVolts: 240 },
          ],
          basis: 'NEC 2023 430.24',
          notes: [],
        },
      ],
      externalMotors: [{ tag: 'S-9', supply: 'ac1', volts: 115, needs: '240/120 V single-phase (a transformer)' }],
      otherLoadsAmps: 15.63,
    };
    const { buf } = await render({ compress: false, font: 'helvetica' }, d);
    const text = extractPdfText(buf).replace(/\s+/g, ' ');
    expect(text).toContain('Motors at another voltage');
    expect(text).toContain(
      'T1: F-1 (230 V single-phase), F-2 (230 V single-phase) fed from a 7.5 kVA 480-240/120 V single-phase transformer in the panel',
    );
    expect(text).toMatch(/S-9 \(115 V single-phase\) needs 240\/120 V single-phase \(a transformer\): fed from a source outside the panel/);
  });
});

describe('PDF submittal drawing pages', () => {
  it('adds a page per schematic sheet, the backplate layout, the terminal plan and the panel marking', async () => {
    const { buildBom } = await import('../../../shared/calc/bom');
    const { buildPanelDrawings } = await import('../../../shared/drawings/panel-drawings');
    const { nameplateSvg, schematicSheets, supplySheetSvg } = await import('../../../shared/drawings/svg');
    const { seedCatalogue, seedLabourUnits } = await import('../bom/fixtures');
    const d0 = data();
    const supply = { volts: 480, phases: 3, hz: 60 };
    const bom = buildBom({
      panelName: 'MCP-1',
      selections: d0.selections,
      panel: d0.rollup,
      supply,
      enclosureType: '12',
      catalogue: seedCatalogue(),
      labourUnits: seedLabourUnits(),
    });
    const byCode = new Map(seedCatalogue().map((i) => [i.code, i]));
    const dr = buildPanelDrawings({
      jobNumber: 'J-2041',
      jobName: 'Clarifier upgrade',
      panelName: 'MCP-1',
      revision: 'R1',
      date: '2025-03-14',
      supply,
      controlVolts: 120,
      bom: bom.lines,
      buckets: d0.selections.map((s) => ({ selection: s, card: null, jogging: false })),
      layout: backplateLayout(bom.lines, (code) => byCode.get(code)),
    });
    const drawings = {
      drawingNumber: dr.drawingNumber,
      sheets: [supplySheetSvg(dr, 'main', 'cpt'), ...schematicSheets(dr)],
      terminals: dr.terminals,
      bomTerminalBlocks: dr.bomTerminalBlocks,
      colourPractice: dr.colourPractice,
      nameplateSvg: nameplateSvg(d0.nameplate, { drawingNumber: dr.drawingNumber, fullLoadWorking: '' }),
      layoutSvg: layoutSheetSvg(dr, dr.sheets.find((s) => s.kind === 'layout')!),
    };
    const pages = (b: Buffer) => (b.toString('latin1').match(/\/Type \/Page\b/g) ?? []).length;
    const without = await render({ compress: false });
    const withDrawings = await render({ compress: false }, { ...d0, drawings });
    // supply sheet + one per motor, at least one terminal-plan page, the marking page
    expect(pages(withDrawings.buf) - pages(without.buf)).toBeGreaterThanOrEqual(drawings.sheets.length + 2);
    // the backplate layout is one page of its own
    const withoutLayout = await render({ compress: false }, { ...d0, drawings: { ...drawings, layoutSvg: null } });
    expect(pages(withDrawings.buf) - pages(withoutLayout.buf)).toBe(1);
    const text = extractPdfText(withDrawings.buf);
    const enclosure = bom.lines.find((l) => l.category === 'enclosure')!.code!;
    // the SVG sheets' text comes out letter by letter: compare without the spaces
    const squashed = text.replace(/\s+/g, '');
    for (const s of ['Backplatelayout', enclosure, 'Scale1:']) expect(squashed, s).toContain(s);
    for (const s of [`Terminal plan - ${dr.drawingNumber}`, `Panel marking - ${dr.drawingNumber}`, `${dr.terminals[0]!.ref}`, 'Cautions'])
      expect(text, s).toContain(s);
    expect(dr.terminals.length).toBe(dr.bomTerminalBlocks);
  });

  it('shows a group of motors on one branch circuit: its path and device, and the group breaker on each one-line (NEC 2023 430.53)', async () => {
    const { selector, supply480, motor } = await import('../engine/selector-setup');
    const g = { branchGroup: 'G-1', groupListedMaxAmps: 60 };
    const out = await selector.selectPanel({
      supply: supply480,
      loads: [motor({ tag: 'CV-1', hp: 10, ...g }), motor({ tag: 'CV-2', hp: 5, ...g }), motor({ tag: 'CV-3', hp: 5, ...g })],
    });
    const { buf } = await render({ compress: false }, { ...data(), selections: out.results, rollup: out.panel });
    const text = extractPdfText(buf);
    // 430.53(C)(4): 35 A (Table 430.52, 10 hp 14 A x 250 %) + 7.6 + 7.6 = 50.2 A -> 50 A (Table 240.6(A)); hand-worked
    for (const s of [
      'Motors on one branch circuit',
      'G-1: CV-1, CV-2, CV-3 at 460 V',
      '430.53(C) applies: one 50 A',
      'group G-1 (430.53(C))',
    ])
      expect(text, s).toContain(s);
    expect(text).not.toContain('?'); // every character within the font's range
  });
});
