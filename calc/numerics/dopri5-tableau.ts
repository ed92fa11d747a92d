/**
 * The Dormand–Prince RK5(4)7M method as numbers: nodes, stage weights, error weights b − b̂ and
 * dense-output weights, shared by the general integrator (ode.ts) and the spin-up model's step.
 */
// Dormand–Prince RK5(4)7M: tableau, error weights b − b̂ and dense-output weights
// (dormand-prince-1980 Table 2; hairer-norsett-wanner-1 Table II.5.2 and §II.6 (6.12); hairer-dopri5-code).
export const C2 = 1 / 5,
  C3 = 3 / 10,
  C4 = 4 / 5,
  C5 = 8 / 9;
export const A21 = 1 / 5;
export const A31 = 3 / 40,
  A32 = 9 / 40;
export const A41 = 44 / 45,
  A42 = -56 / 15,
  A43 = 32 / 9;
export const A51 = 19372 / 6561,
  A52 = -25360 / 2187,
  A53 = 64448 / 6561,
  A54 = -212 / 729;
export const A61 = 9017 / 3168,
  A62 = -355 / 33,
  A63 = 46732 / 5247,
  A64 = 49 / 176,
  A65 = -5103 / 18656;
export const A71 = 35 / 384,
  A73 = 500 / 1113,
  A74 = 125 / 192,
  A75 = -2187 / 6784,
  A76 = 11 / 84;
export const E1 = 71 / 57600,
  E3 = -71 / 16695,
  E4 = 71 / 1920,
  E5 = -17253 / 339200,
  E6 = 22 / 525,
  E7 = -1 / 40;
export const D1 = -12715105075 / 11282082432,
  D3 = 87487479700 / 32700410799,
  D4 = -10690763975 / 1880347072,
  D5 = 701980252875 / 199316789632,
  D6 = -1453857185 / 822651844,
  D7 = 69997945 / 29380423;
