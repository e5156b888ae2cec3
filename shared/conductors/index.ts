// Conductor engineering core: sizes, materials, DC resistance, ampacity, OCPD limits, voltage drop and
// size suggestions. Pure and table-driven; each table names its published source beside it:
// - sizes.ts       ASTM B258 AWG geometry, NEC Ch. 9 Table 8 areas, SAE J1127/J1128 areas, IEC 60228 sizes
// - materials.ts   IEC 60028 copper, aluminium at 61 % IACS, tinned copper ratio from IEC 60228
// - resistance.ts  ρ/A × lay factor (AWG, checked against NEC Ch. 9 Table 8); IEC 60228 maxima (metric)
// - nec310.ts      NEC Table 310.16 (2011+), 310.15(B)(1) ambient, 310.15(C)(1) adjustment
// - cfr183.ts      33 CFR 183.425 Table 5, Note 1 engine-space factors, USCG bundling factors
// - maxOcpd.ts     NEC 240.4(B)/(D); ABYC E-11 11.10 150 % rule
// - voltageDrop.ts ABYC E-11 / ISO 10133 3 % / 10 %; NEC 210.19(A) informational note
// Results are design aids: local codes, the authority having jurisdiction and licensed practice prevail.
export * from './sizes'
export * from './materials'
export * from './profiles'
export * from './resistance'
export * from './ampacity'
export * from './maxOcpd'
export * from './voltageDrop'
export * from './suggest'
export { IEC_60228_MAX_RESISTANCE_20C } from './iec60228'
export { ConductorInputError } from './_lib/inputs'
