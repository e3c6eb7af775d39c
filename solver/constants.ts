// Exact conversion factors (NIST SP 811, Appendix B) and standard gravity (3rd CGPM, 1901).

/** standard acceleration of gravity, m/s² */
export const G0 = 9.80665;
/** pound-force, N */
export const LBF_N = 4.4482216152605;
/** inch, m */
export const INCH_M = 0.0254;
/** foot, m */
export const FOOT_M = 0.3048;
/** pound (avoirdupois) mass, kg */
export const LBM_KG = 0.45359237;
/** US liquid gallon, m³ */
export const GALLON_US_M3 = 3.785411784e-3;
/** pound-force per square inch, Pa */
export const PSI_PA = LBF_N / (INCH_M * INCH_M);
/** pound-force per square foot, Pa */
export const PSF_PA = LBF_N / (FOOT_M * FOOT_M);
/** conventional inch of water (a column of 1000 kg/m³ under standard gravity: NIST SP 811 lists 2.490 889 E+02 Pa), Pa */
export const INCH_WATER_PA = 1000 * G0 * INCH_M;
/** standard atmosphere at sea level, Pa (ISO 2533; the standard atmosphere of the 10th CGPM, 1954) */
export const STANDARD_ATMOSPHERE_PA = 101325;
