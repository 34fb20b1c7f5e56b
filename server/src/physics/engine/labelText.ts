/** Display text and constructors for the four label kinds. */
import { halfText } from './halfIntegers';
import type { CoupledFLabel, CoupledJLabel, UncoupledJILabel, UncoupledLSLabel } from './types';

/** With no nucleus (I = 0) F is J, and the text says so. */
export function fLabel(twoF: number, twoMF: number, noNucleus = false): CoupledFLabel {
  const text = noNucleus ? `J=${halfText(twoF)}, m_J=${halfText(twoMF, true)}` : `F=${halfText(twoF)}, m_F=${halfText(twoMF, true)}`;
  return { scheme: 'F', twoF, twoMF, text };
}

export function jLabel(twoJ: number, twoMJ: number, twoMI: number | null): CoupledJLabel {
  const nuc = twoMI === null ? '' : `, m_I=${halfText(twoMI, true)}`;
  return { scheme: 'J', twoJ, twoMJ, twoMI, text: `J=${halfText(twoJ)}, m_J=${halfText(twoMJ, true)}${nuc}` };
}

export function jiLabel(twoMJ: number, twoMI: number, noNucleus = false): UncoupledJILabel {
  const text = noNucleus ? `m_J=${halfText(twoMJ, true)}` : `m_J=${halfText(twoMJ, true)}, m_I=${halfText(twoMI, true)}`;
  return { scheme: 'mJ,mI', twoMJ, twoMI, text };
}

export function lsLabel(twoML: number, twoMS: number, twoMI: number | null): UncoupledLSLabel {
  const nuc = twoMI === null ? '' : `, m_I=${halfText(twoMI, true)}`;
  return {
    scheme: 'mL,mS',
    twoML,
    twoMS,
    twoMI,
    text: `m_L=${halfText(twoML, true)}, m_S=${halfText(twoMS, true)}${nuc}`,
  };
}

/** Low-field label of a whole term's state: |J, F, m_F>. */
export function jfLabel(twoJ: number, twoF: number, twoMF: number): CoupledFLabel {
  return { scheme: 'F', twoF, twoMF, twoJ, text: `J=${halfText(twoJ)}, F=${halfText(twoF)}, m_F=${halfText(twoMF, true)}` };
}
