// Constants of the ASTM F1216 Appendix X1 design equations (from memory; the worked examples
// in tests/unit/design reproduce a published textbook's figures with them).

// ASTM F1216 X1: recommended factor of safety N = 2.0.
export const DEFAULT_SAFETY_FACTOR = 2;
// ASTM F1216 X1: enhancement factor of the soil and existing pipe, K = 7 recommended.
export const DEFAULT_ENHANCEMENT_K = 7;
// ASTM F1216 X1: Poisson's ratio ν = 0.3.
export const DEFAULT_POISSON = 0.3;
// ASTM F1216 X1: water pressure 0.433 psi per foot of head (62.4 lb/ft³ ÷ 144 in²/ft²).
export const PSI_PER_FT_WATER = 0.433;
// ASTM F1216 X1.3: water buoyancy factor R_w = 1 − 0.33·H_w/H, not below 0.67.
export const BUOYANCY_SLOPE = 0.33;
export const MIN_BUOYANCY_FACTOR = 0.67;
// ASTM F1216 X1.3: coefficient of elastic support B′ = 1 / (1 + 4·e^(−0.065·H)), H in ft.
export const ELASTIC_SUPPORT_RATE_PER_FT = 0.065;
// ASTM F1216 X1.3: the constant 32 in q_t = (1/N)·[32·R_w·B′·E′s·C·(E_L·I/D³)]^½.
export const FULLY_DETERIORATED_CONSTANT = 32;
// ASTM F1216 X1.2.1 (from memory): with no groundwater above the invert, a partially deteriorated design
// should have a dimension ratio DR = D/t of at most 100, i.e. t ≥ D/100.
export const MAX_DIMENSION_RATIO = 100;
// ASTM F1216 X1.4: minimum pipe stiffness E·I/D³ ≥ 0.093 psi.
export const MIN_STIFFNESS_PSI = 0.093;
// 1 ft = 12 in, exact; 1 ft² = 144 in², exact.
export const IN_PER_FT = 12;
export const IN2_PER_FT2 = 144;
