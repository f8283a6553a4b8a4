// Conversion factors to the SI unit we store. Each factor is from NIST Special Publication 811
// (2008 edition), Appendix B "Conversion factors"; "exact" marks factors that are exact by
// definition of the unit.

/** Millimetres per unit of length. */
export const MM_PER = {
  mm: 1,
  m: 1000, // SI prefix, exact
  in: 25.4, // NIST SP 811 App. B: 1 in = 2.54 E-02 m, exact
  ft: 304.8, // NIST SP 811 App. B: 1 ft = 3.048 E-01 m, exact
} as const;

/** Kilopascals per unit of pressure. */
export const KPA_PER = {
  kPa: 1,
  bar: 100, // NIST SP 811 App. B: 1 bar = 1.0 E+05 Pa, exact
  psi: 6.894757, // NIST SP 811 App. B: 1 psi (lbf/in²) = 6.894 757 E+00 kPa
} as const;

/** Litres per unit of volume. */
export const L_PER = {
  L: 1,
  'US gal': 3.785411784, // NIST SP 811 App. B: 1 gal (U.S.) = 3.785 411 784 E-03 m³, exact (231 in³)
} as const;

/** Newtons per unit of force. */
export const N_PER = {
  N: 1,
  kN: 1000, // SI prefix, exact
  // NIST SP 811 App. B lists 1 lbf = 4.448 222 E+00 N; the full value follows exactly from
  // 0.453 592 37 kg × 9.806 65 m/s² (both exact by definition).
  lbf: 4.4482216152605,
} as const;

// NIST SP 811 §4.2.1.1 and App. B.9: t/°F = 1.8 · t/°C + 32, exact.
export const F_PER_C = 9 / 5;
export const F_OFFSET = 32;

// NIST SP 811 §4.2.1.1: 0 °C = 273.15 K, exact. Used to reject temperatures below absolute zero.
export const ABSOLUTE_ZERO_C = -273.15;
