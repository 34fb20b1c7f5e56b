/** The human-readable report printed by `sublevel eval`. */
import { spectrumWidthsText } from '../eval/spectrumEvaluation';
import { ATOMIC_MASS_UNIT, BOHR_RADIUS } from '../physics/constants';
import { halfText } from '../eval/halves';
import { curvatureText, fieldText, frequencyText, gradientText, lengthText, percentText, sensitivityText, speedText, trimNumber, withUncertainty } from '../eval/quantityText';
import { beamPositionNoise, DIP_NOISE, SENSITIVITY_NOISE } from '../eval/noiseFloors';
import { polarizationSymbol } from '../eval/polarizationName';
import { lonePeak, MERGED_PEAK_TEXT, nothingToResolveText } from '../eval/lonePeak';
import { fieldInUnit, inWrittenUnit, magnetFieldText, sourcedFrequencyText, workingFieldUnit, ZETA_DIGITS } from '../eval/writtenUnit';
import type {
  BeamResult,
  DiagnosticResult,
  FieldSourceResult,
  EvaluationResult,
  LevelResult,
  LineResult,
  MagneticTransitionResult,
  MagnetResult,
  ResonanceResult,
  TermResult,
} from '../eval/resultTypes';
import { table } from './table';
import { fieldScopeLine } from '../eval/fieldScopeText';
import { sourceHeadline, sourceLines } from '../eval/fieldSourceText';
import { slowerReport } from '../eval/slowerText';
import { lineWavelengthText } from '../eval/wavelengthText';
import { trapReport } from './trapReport';
import { averagedOverText, magnetGradientNote } from '../eval/magnetGradientText';

export function textReport(file: string, r: EvaluationResult): string[] {
  const out: string[] = [];
  const atFieldText = (f: { source: FieldSource; field_T: number; field_T_unc?: number }): string =>
    `${f.source.kind} ${f.source.name} = ${withUncertainty(f.field_T, f.field_T_unc, (v) => fieldInUnit(v, { unit: workingFieldUnit(r, f.source) }))}`;
  out.push(`Sublevel evaluation of ${file}`);
  out.push(`constants: ${r.constants}; g_s = ${r.settings.g_s === 2 ? '2 (textbook)' : '|g_e| (CODATA)'}; energies are E/h`);
  for (const s of r.species) {
    out.push('');
    const where = s.defined_in !== undefined ? `defined in ${s.defined_in}${s.builtin ? ', built-in data' : ''}` : s.builtin ? 'built-in data' : 'defined in this file';
    out.push(`species ${s.name} (${where})`);
    const mass = s.mass_kg ? `${trimNumber(s.mass_kg.value / ATOMIC_MASS_UNIT, 9)} u` : 'not given';
    out.push(`  mass ${mass}   I = ${fraction(s.I)}   g_I = ${trimNumber(s.g_I.value, 8)}  [${s.g_I.source}]`);
    const scope = fieldScopeLine(r, s);
    if (scope) out.push(scope);
    for (const l of r.levels.filter((x) => x.species === s.name)) out.push(...levelReport(l, atFieldText));
    for (const t of r.terms.filter((x) => x.species === s.name)) out.push(...termReport(t, atFieldText));
  }
  if (r.magnets.length > 0) {
    out.push('');
    out.push('magnets');
    out.push(
      ...table(
        ['name', 'field', 'gradient', 'length'],
        r.magnets.map((m) => [
          m.name,
          m.field_T !== undefined ? magnetFieldText(m.field_T, m.field_T_unc, m.field_unit) : '—',
          m.gradient_T_per_m !== undefined ? withUncertainty(m.gradient_T_per_m, m.gradient_T_per_m_unc, (v) => inWrittenUnit(v, 'gradient', m.gradient_unit) ?? gradientText(v)) : gradientText(undefined),
          m.length_m !== undefined ? withUncertainty(m.length_m, m.length_m_unc, (v) => inWrittenUnit(v, 'length', m.length_unit) ?? lengthText(v)) : lengthText(undefined),
        ]),
      ).map((l) => '  ' + l),
    );
    for (const m of r.magnets) {
      const note = magnetGradientNote(m, r.beams);
      if (note) out.push(`  ${m.name}: ${note}`);
    }
  }
  for (const f of r.fieldSources ?? []) out.push(...fieldSourceReport(f));
  for (const b of r.beams) out.push(...beamReport(b, r.magnets.find((m) => m.name === b.magnet)));
  for (const l of r.lines) out.push(...lineReport(l, atFieldText, r.diagnostics));
  for (const x of r.resonances) out.push(...resonanceReport(x, atFieldText));
  for (const s of r.slowers ?? []) out.push('', ...slowerReport(s));
  for (const t of r.traps ?? []) out.push(...trapReport(t));
  const counts = (sev: string): number => r.diagnostics.filter((d) => d.severity === sev).length;
  out.push('');
  const plural = (n: number, word: string): string => `${n} ${word}${n === 1 ? '' : 's'}`;
  out.push(`diagnostics: ${plural(counts('error'), 'error')}, ${plural(counts('warning'), 'warning')}, ${plural(counts('info') + counts('hint'), 'note')}`);
  for (const d of r.diagnostics) out.push(`  ${d.line}:${d.column} ${d.severity} ${d.code} ${d.message}`);
  return out;
}

function levelReport(l: LevelResult, atFieldText: AtFieldText): string[] {
  const out: string[] = [];
  out.push('');
  const config = l.designation.configuration ? `${l.designation.configuration} ` : '';
  out.push(`  level ${l.level}: ${config}${l.designation.unicode}   S = ${fraction(l.S)}, L = ${l.L}, J = ${l.J_text}, ${l.sublevel_count} sublevel${l.sublevel_count === 1 ? '' : 's'}`);
  const g = l.g_J;
  const measured = g.measured ? `   measured ${trimNumber(g.measured.value, 8)} [${g.measured.source}]` : '';
  out.push(`    g_J (Landé) = ${trimNumber(g.lande, 9)}  (= ${g.lande_fraction} with g_s = 2)${measured}`);
  out.push(`    g_J used = ${withUncertainty(g.used, g.used_unc, (v) => trimNumber(v, 9))}  [${g.used_source}]`);
  if (l.hyperfine) {
    const h = l.hyperfine;
    const consts = [`A = ${sourcedFrequencyText(h.A_Hz, 10)} [${h.A_Hz.source}]`];
    if (h.B_Hz) consts.push(`B = ${sourcedFrequencyText(h.B_Hz, 8)} [${h.B_Hz.source}]`);
    if (h.C_Hz) consts.push(`C = ${sourcedFrequencyText(h.C_Hz, 6)} [${h.C_Hz.source}]`);
    for (const c of consts) out.push(`    ${c}`);
    out.push(
      ...table(
        ['F', 'zero-field shift', 'g_F'],
        h.levels.map((f) => [f.F_text, withUncertainty(f.shift_Hz, f.shift_Hz_unc, (v) => frequencyText(v, 10)), withUncertainty(f.g_F, f.g_F_unc, (v) => trimNumber(v, 8))]),
      ).map((x) => '      ' + x),
    );
    for (const iv of h.intervals) out.push(`    interval F=${fraction(iv.F_lower)} → F=${fraction(iv.F_upper)}: ${withUncertainty(iv.interval_Hz, iv.interval_Hz_unc, (v) => frequencyText(v, 12))}`);
  }
  for (const f of l.at_fields) {
    const regime = f.regime ? `; ${f.regime.verdict}${f.regime.x !== null ? `, x = ${trimNumber(f.regime.x, 3)}` : ''}` : '';
    out.push(`    at ${atFieldText(f)}${regime}:`);
    if (f.exact.length === 0) {
      out.push(...table(['sublevel', 'linear energy'], f.linear.map((s) => [s.label, frequencyText(s.energy_Hz, 9)])).map((x) => '      ' + x));
      continue;
    }
    out.push(
      ...table(
        ['low-field label', 'high-field label', 'energy (exact)', 'linear formula', 'moment/μ_B'],
        f.exact.map((s) => [
          s.low_label,
          s.high_label,
          withUncertainty(s.energy_Hz, s.energy_Hz_unc, (v) => frequencyText(v, 10)),
          s.linear_energy_Hz !== undefined ? frequencyText(s.linear_energy_Hz, 10) : '—',
          withUncertainty(s.moment_bohr, s.moment_bohr_unc, (v) => trimNumber(v, 6)),
        ]),
      ).map((x) => '      ' + x),
    );
  }
  return out;
}

/** The whole term's hyperfine parameters and the J-level constants they give. */
function termHyperfineLines(h: NonNullable<TermResult['hyperfine']>): string[] {
  const radial = `    hyperfine (${h.source}): a_L = ${frequencyText(h.a_orbital_Hz, 8)}, a_SD = ${frequencyText(h.a_spin_dipolar_Hz, 8)}, a_C = ${frequencyText(h.a_contact_Hz, 8)}, b_L = ${frequencyText(h.b_orbital_Hz, 8)}`;
  return [radial, ...table(['J', 'A', 'B'], h.levels.map((l) => [l.J_text, frequencyText(l.A_Hz, 8), frequencyText(l.B_Hz, 8)])).map((x) => '      ' + x)];
}

function termReport(t: TermResult, atFieldText: AtFieldText): string[] {
  const out = ['', `  term ${t.level}: ${t.designation.configuration ? t.designation.configuration + ' ' : ''}${t.designation.unicode}   S = ${fraction(t.S)}, L = ${t.L}, ${t.zeta_Hz ? `fine structure ζ = ${sourcedFrequencyText(t.zeta_Hz, ZETA_DIGITS)} [${t.zeta_Hz.source}]` : 'fine structure from the J-level energies'}`];
  out.push(...table(['J', 'zero-field shift', 'g_J'], t.fine_levels.map((f) => [f.J_text, withUncertainty(f.shift_Hz, f.shift_Hz_unc, (v) => frequencyText(v, 10)), trimNumber(f.g_J, 8)])).map((x) => '      ' + x));
  if (t.hyperfine) out.push(...termHyperfineLines(t.hyperfine));
  if (t.diamagnetic) out.push(`    diamagnetic term: ⟨r²⟩ = ${trimNumber(t.diamagnetic.r2_m2 / BOHR_RADIUS ** 2, 6)} a0², e²⟨r²⟩/8mₑh = ${frequencyText(t.diamagnetic.Hz_per_T2, 6)}/T² × ⟨sin²θ⟩ of m_L`);
  for (const f of t.at_fields) {
    const regime = f.regime ? `; ${f.regime.verdict}${f.regime.x !== null ? `, x = ${trimNumber(f.regime.x, 3)}` : ''}` : '';
    out.push(`    at ${atFieldText(f)}${regime}:`);
    out.push(
      ...table(
        ['low-field label', 'high-field label', 'energy (exact)', 'moment/μ_B'],
        f.exact.map((s) => [s.low_label, s.high_label, withUncertainty(s.energy_Hz, s.energy_Hz_unc, (v) => frequencyText(v, 10)), withUncertainty(s.moment_bohr, s.moment_bohr_unc, (v) => trimNumber(v, 6))]),
      ).map((x) => '      ' + x),
    );
  }
  return out;
}

function lineReport(l: LineResult, atFieldText: AtFieldText, diagnostics: readonly DiagnosticResult[]): string[] {
  const written = l.written_as_emission ? ' (written as emission, upper level first)' : '';
  const out = ['', `line ${l.name}: ${l.lower ?? '?'} -> ${l.upper ?? '?'}${l.species ? ` (${l.species})` : ''}${written}`];
  if (l.g_eff !== undefined) out.push(`  effective Landé factor g_eff = ${trimNumber(l.g_eff, 7)}`);
  if (l.line_centre_Hz !== undefined) {
    // A negative centre (the levels the other way round) gets the wavelength of |ν|, saying so, as the hover does.
    const wavelength = l.line_centre_Hz !== 0 && Number.isFinite(l.line_centre_Hz) ? ` (${lineWavelengthText(l.line_centre_Hz, l.line_centre_Hz_unc, 9)})` : '';
    out.push(`  line centre ${withUncertainty(l.line_centre_Hz, l.line_centre_Hz_unc, (v) => frequencyText(v, 13))}${wavelength}`);
  }
  const at = l.at_fields[0];
  if (!at) {
    // Point only at findings that exist: the ones about this line, by place and code.
    const why = diagnostics.filter((d) => d.severity !== 'info' && d.severity !== 'hint' && d.message.includes(`line '${l.name}'`));
    out.push(why.length > 0 ? `  no components: see ${why.map((d) => `${d.severity} ${d.code} at ${d.line}:${d.column}`).join(', ')}` : '  no components were computed');
    return out;
  }
  // With a whole term the strengths are per orbital reduced element (docs/transitions.md).
  const meaning = l.strengths_reduced_in === 'L' ? 'strength = (2L_u+1)|<l|d_q|u>|² / |<L_u||d||L_l>|²' : 'strength = branching fraction of the upper sublevel';
  const gEff = at.g_eff_centroid !== undefined ? `; σ± centroid g_eff ${trimNumber(at.g_eff_centroid, 6)}` : '';
  out.push(`  ${at.components.length} Zeeman components at ${atFieldText(at)} (${meaning}${gEff}):`);
  out.push(
    ...table(
      ['offset', 'pol.', 'strength', 'lower', 'upper'],
      at.components.map((c) => [withUncertainty(c.offset_Hz, c.offset_Hz_unc, (v) => frequencyText(v, 9)), polarizationSymbol(c.polarization), trimNumber(c.strength, 5), c.lower_label, c.upper_label]),
    ).map((x) => '    ' + x),
  );
  if (at.spectrum) {
    const s = at.spectrum;
    out.push(`  spectrum ${s.direction} the field, ${s.light} light: ${spectrumWidthsText(s)}`);
    out.push(`    highest at offset ${frequencyText(s.peak_offset_Hz, 7)}; ${s.points} samples from ${frequencyText(s.window_Hz[0], 5)} to ${frequencyText(s.window_Hz[1], 5)} (sublevel spectrum writes them)`);
  }
  if (l.at_fields.length > 1) out.push(`  (components at the other working fields: sublevel eval --format json)`);
  return out;
}

function resonanceReport(x: ResonanceResult, atFieldText: AtFieldText): string[] {
  const [fromUnit, toUnit] = x.range_units ?? [];
  // Fields found in the range are shown in the unit family the range was written in.
  const found = (t: number, u?: number): string => withUncertainty(t, u, (v) => fieldInUnit(v, { family: toUnit, digits: 8 }));
  const out = ['', `resonance ${x.name}: level ${x.level ?? '?'}${x.species ? ` (${x.species})` : ''}, searched ${fieldInUnit(x.range_T[0], { unit: fromUnit })} … ${fieldInUnit(x.range_T[1], { unit: toUnit })}`];
  const row = (t: MagneticTransitionResult): string[] => [
    `${t.lower_label} ↔ ${t.upper_label}`,
    polarizationSymbol(t.kind),
    withUncertainty(t.frequency_Hz, t.frequency_Hz_unc, (v) => frequencyText(v, 12)),
    withUncertainty(t.df_dB_Hz_per_T, t.df_dB_Hz_per_T_unc, (v) => sensitivityText(v, 7, SENSITIVITY_NOISE)),
    curvatureText(t.d2f_dB2_Hz_per_T2, 7),
  ];
  for (const f of x.at_fields) {
    out.push(`  at ${atFieldText(f)}:`);
    out.push(...table(['transition', 'kind', 'frequency', 'df/dB', 'd²f/dB²'], f.transitions.map(row)).map((l) => '    ' + l));
  }
  if (x.field_insensitive) {
    out.push(
      x.field_insensitive.length === 0
        ? '  no field-insensitive point in the range'
        : `  field-insensitive (df/dB = 0) at: ${x.field_insensitive.map((p) => `${found(p.field_T, p.field_T_unc)} (f = ${withUncertainty(p.frequency_Hz, p.frequency_Hz_unc, (v) => frequencyText(v, 12))})`).join(', ')}`,
    );
  }
  if (x.resonances) {
    out.push(x.resonances.length === 0 ? '  not resonant anywhere in the range' : '  resonant at:');
    out.push(...x.resonances.map((r) => `    ${found(r.field_T, r.field_T_unc)}: ${r.transition.lower_label} ↔ ${r.transition.upper_label} (${polarizationSymbol(r.transition.kind)})`));
  }
  return out;
}

function fieldSourceReport(f: FieldSourceResult): string[] {
  const out = ['', sourceHeadline(f), ...sourceLines(f).map((l) => `  ${l}`)];
  if (f.cautions.length > 0) {
    out.push('  cautions:');
    for (const c of f.cautions) out.push(`    - ${c}`);
  }
  return out;
}

function beamReport(b: BeamResult, magnet: MagnetResult | undefined): string[] {
  const out = ['', `beam ${b.name}: ${b.species ?? '?'} ${b.level ?? '?'} through magnet ${b.magnet ?? '?'}`];
  if (!b.computed) {
    out.push('  not computed: the beam lacks a setting it needs (see diagnostics)');
    return out;
  }
  if (b.speeds) {
    out.push(`  speeds: most probable ${speedText(b.speeds.most_probable_m_per_s)}, mean ${speedText(b.speeds.mean_m_per_s)}, rms spread ${speedText(b.speeds.rms_spread_m_per_s, 3)}`);
  }
  if (b.field_map) out.push(...fieldMapLines(b.field_map, b.magnet, magnet));
  const noise = beamPositionNoise(b);
  out.push(
    ...table(
      ['sublevel', 'high-field label', 'moment/μ_B', 'mean deflection', 'own peak at'],
      b.sublevels.map((s) => [s.label, s.high_label, withUncertainty(s.moment_bohr, s.moment_bohr_unc, (v) => trimNumber(v, 6)), withUncertainty(s.mean_deflection_m, s.mean_deflection_m_unc, (v) => lengthText(v, 4, noise)), s.peak_m === null ? 'no atoms' : withUncertainty(s.peak_m, s.peak_m_unc, (v) => lengthText(v, 4, noise))]),
    ).map((x) => '  ' + x),
  );
  out.push('  peaks on the detector:');
  out.push(
    ...table(
      ['position', 'FWHM', 'sublevels'],
      b.peaks.map((p) => [withUncertainty(p.position_m, p.position_m_unc, (v) => lengthText(v, 4, noise)), p.fwhm_m === null ? 'off grid' : lengthText(p.fwhm_m), p.members.join('; ')]),
    ).map((x) => '    ' + x),
  );
  const lone = lonePeak(b);
  if (lone) out.push(`  one peak: ${lone === 'nothing-to-resolve' ? nothingToResolveText(b) : `${MERGED_PEAK_TEXT} → NOT resolved`}`);
  for (const p of b.pairs) {
    out.push(`  peaks ${p.left + 1} and ${p.right + 1}: dip ${percentText(p.dip_ratio, 3, DIP_NOISE)} of the smaller peak → ${p.resolved ? 'resolved' : 'NOT resolved'} (criterion ≤ ${percentText(b.criterion_dip_ratio)})`);
  }
  if (b.resolving_advice) out.push(`  ${b.resolving_advice}`);
  out.push('  cautions:');
  for (const c of b.cautions) out.push(`    - ${c}`);
  return out;
}

/** How a field-map beam's deflections were made (docs/beam.md §7). */
function fieldMapLines(m: NonNullable<BeamResult['field_map']>, name: string | undefined, magnet: MagnetResult | undefined): string[] {
  const ratio = m.worst_adiabaticity;
  const adiabatic = ratio === null ? 'the field passes through zero' : `${ratio < 1e-3 ? 'below 0.001' : trimNumber(ratio, 2)} (limit ${trimNumber(m.adiabatic_limit, 2)})`;
  return [
    `  deflections from ${m.flights} flights through the sources' field (field map), peaks at the reference speed ${speedText(m.reference_speed_m_per_s)}`,
    `  |B| on the beam line ${fieldText(m.field_on_line_min_T, 4)} … ${fieldText(m.field_on_line_max_T, 4)}; ∂|B|/∂z averaged along ${averagedOverText(magnet)} through magnet ${name ?? '?'} is ${gradientText(m.mean_gradient_T_per_m, 4)}${magnet?.gradient_T_per_m !== undefined ? ` (at its centre ${gradientText(magnet.gradient_T_per_m, 5)})` : ''}, changing ${percentText(m.gradient_variation, 2)} across the beam; field turning rate / Larmor frequency ${adiabatic}`,
  ];
}

type FieldSource = { kind: 'field' | 'magnet'; name: string };
type AtFieldText = (f: { source: FieldSource; field_T: number; field_T_unc?: number }) => string;

/** A quantum number given as a number (1.5) in the result, written as text (3/2). */
function fraction(x: number): string {
  return halfText(Math.round(2 * x));
}
