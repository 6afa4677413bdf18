// Physical and statistical constants shared by the process calculations.

/** Molar gas constant, J/(mol·K); exact in the 2019 SI (REFERENCES: value from memory). */
export const GAS_CONSTANT_J_PER_MOL_K = 8.314462618;

/** 0 °C in kelvin. */
export const ZERO_CELSIUS_IN_KELVIN = 273.15;

/** 1 inch = 25.4 mm = 25 400 µm, so drop spacing in µm is 25 400 / dpi. */
export const MICROMETRES_PER_INCH = 25_400;

/** 1 pL = 10⁻¹⁵ m³ = 1000 µm³. */
export const CUBIC_MICROMETRES_PER_PICOLITRE = 1000;

/**
 * d₂ for moving ranges of two points: σ̂ = MR̄ / d₂ (standard control-chart table, e.g. ASTM E2587;
 * table value from memory).
 */
export const D2_MOVING_RANGE_OF_TWO = 1.128;

/** D₄ for moving ranges of two points: MR chart UCL = D₄·MR̄ (table value from memory; D₃ = 0). */
export const D4_MOVING_RANGE_OF_TWO = 3.267;
