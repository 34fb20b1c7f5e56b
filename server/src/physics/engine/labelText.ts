/** Display text and constructors for the four label kinds. */
import { halfText } from './halfIntegers';
import type { CoupledFLabel, CoupledJLabel, UncoupledJILabel, UncoupledLSLabel } from './types';

export function fLabel(twoF: number, twoMF: number): CoupledFLabel {
  return { scheme: 'F', twoF, twoMF, text: `F=${halfText(twoF)}, m_F=${halfText(twoMF, true)}` };
}

export function jLabel(twoJ: number, twoMJ: number, twoMI: number | null): CoupledJLabel {
  const nuc = twoMI === null ? '' : `, m_I=${halfText(twoMI, true)}`;
  return { scheme: 'J', twoJ, twoMJ, twoMI, text: `J=${halfText(twoJ)}, m_J=${halfText(twoMJ, true)}${nuc}` };
}

export function jiLabel(twoMJ: number, twoMI: number): UncoupledJILabel {
  return { scheme: 'mJ,mI', twoMJ, twoMI, text: `m_J=${halfText(twoMJ, true)}, m_I=${halfText(twoMI, true)}` };
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
