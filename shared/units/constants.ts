/**
 * Exact physical and oilfield constants. Every oilfield factor below is derived from the
 * international yard and pound (1959: 1 ft = 0.3048 m, 1 lb = 0.45359237 kg), the US gallon
 * (231 in³) and standard gravity (CGPM 1901), so the numbers agree with each other to the last digit.
 */

/** Standard gravity in m/s² (3rd CGPM, 1901). */
export const G = 9.80665;

/** One international foot in metres (exact by the 1959 agreement). */
export const FT_M = 0.3048;

/** One inch in metres (exact). */
export const IN_M = 0.0254;

/** One avoirdupois pound in kilograms (exact). */
export const LB_KG = 0.45359237;

/** One pound-force per square inch in pascals: lb·g / in² = 6894.757293168361 Pa. */
export const PSI_PA = 6894.757293168361;

/** One US liquid gallon in m³: 231 in³ exactly. */
export const US_GAL_M3 = 231 * IN_M ** 3;

/** One pound per US gallon in kg/m³ (≈ 119.826427). */
export const PPG_KGM3 = LB_KG / US_GAL_M3;

/**
 * Specific gravity 1 in kg/m³. SG is taken against 1000 kg/m³ (water near 4 °C), which is what
 * makes 1 sg = 8.345404 ppg; the rounded 8.33 ppg is water at about 20 °C.
 */
export const SG_KGM3 = 1000;

/**
 * Pressure gradient in psi/ft of a 1 ppg fluid column: exactly 12/231 ≈ 0.051948.
 * It is exact for the US gallon of 231 in³ and standard gravity (lb·g cancels between ppg and psi,
 * leaving 12 in/ft ÷ 231 in³/gal); the rounded 0.052 is common practice, not used here.
 */
export const PSI_PER_FT_PER_PPG = 12 / 231;

/** One darcy in m² (9.869233e-13, the conventional SI value). */
export const DARCY_M2 = 9.869233e-13;

/** One Julian year (365.25 days) in seconds, the year used for geological time here. */
export const YEAR_S = 365.25 * 86400;

/** One million Julian years in seconds. */
export const MYR_S = 1e6 * YEAR_S;
