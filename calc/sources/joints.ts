import type { Source } from "./types.ts";

/**
 * Bibliography entries used by the bolted-joint modules (calc/loads/joint.ts, calc/loads/inch-fasteners.ts)
 * and the shear-strength rule of calc/fasteners.ts. Locators marked "from memory" were not seen in a
 * retrieved copy of the work.
 */
export const JOINT_SOURCES = {
  "shigley-mechanical-design": {
    author: "R. G. Budynas, J. K. Nisbett",
    title: "Shigley's Mechanical Engineering Design",
    publication: "McGraw-Hill, 9th ed., 2011",
    locator:
      "ch. 8 Screws, Fasteners, and the Design of Nonpermanent Joints: Tables 8-1 and 8-2 (stress areas; root diameters d_r = d − 1.226 869 p metric and d − 1.299 038 p inch, from ANSI B1.1); Eq. 8-17 (bolt stiffness k_b); Eq. 8-22 (member stiffness, 30° frustum); Table 8-7 (effective grip of a cap screw, from memory); Table 8-8 (Wileman constants A, B, from memory); F_b = CP + F_i and F_m = (1 − C)P − F_i (p. 461); Eq. 8-26 and 8-27 (torque T = K F_i d, K ≈ 0.20 for f = f_c = 0.15, p. 463); Eqs. 8-28 to 8-30 (yielding factor n_p, load factor n_L, separation factor n_0); Eqs. 8-31 and 8-32 (F_i = 0.75 F_p reused, 0.90 F_p permanent; F_p = A_t S_p, p. 467); Table 8-9 (SAE grades, p. 458); Table 8-15 (torque factors K, p. 464); Examples 8-3 and 8-4; §8-12 (bolts in shear: bending of the bolt); Table A-5 (E of steel 207 GPa, aluminium 71.7 GPa)",
  },
  "asme-b1-1": {
    author: "American Society of Mechanical Engineers",
    title: "Unified Inch Screw Threads (UN, UNR, and UNJ Thread Forms)",
    publication: "ASME B1.1 (edition of 2003 and its predecessors back to ANSI B1.1-1974)",
    locator:
      "tensile stress area A_s = 0.7854 (D − 0.9743/n)²; class 2A pitch-diameter tolerance 0.0015 D^(1/3) + 0.0015 √LE + 0.015 P^(2/3) with LE = D, allowance 0.3 × that tolerance, major-diameter tolerance 0.060 P^(2/3), class 2B pitch-diameter tolerance 1.3 × class 2A (formulas as reproduced in published thread-limit tables; clause numbers not confirmed)",
  },
  "fed-std-h28-2": {
    author: "U.S. General Services Administration",
    title: "Screw-Thread Standards for Federal Services, Section 2: Unified Inch Screw Threads — UN and UNR Thread Forms",
    publication: "FED-STD-H28/2B, 1991",
    locator:
      "thread shear areas: internal A_n = π n L_e D_s,min [1/(2n) + 0.577 35 (D_s,min − E_n,max)], external A_s = π n L_e K_n,max [1/(2n) + 0.577 35 (E_s,min − K_n,max)]; geometric minimum values (appendix number from memory); tensile stress area table",
  },
  "machinerys-handbook": {
    author: "E. Oberg, F. D. Jones, H. L. Horton, H. H. Ryffel",
    title: "Machinery's Handbook",
    publication: "Industrial Press, 30th ed., 2016",
    locator: "Threads and threading: length of engagement and thread shear areas (the FED-STD-H28 formulas); section title from memory",
  },
  "asme-b1-13m": {
    author: "American Society of Mechanical Engineers",
    title: "Metric Screw Threads: M Profile",
    publication: "ASME B1.13M-2005 (interchangeable with ISO 68-1 and ISO 965-1 practice)",
    locator: "limits of size: external class 6g major diameter minimum; internal class 6H pitch diameter maximum",
  },
  "iso-965-1": {
    author: "International Organization for Standardization",
    title: "ISO general purpose metric screw threads — Tolerances — Part 1: Principles and basic data",
    publication: "ISO 965-1:2013",
    locator: "pitch-diameter tolerance T_D2 of grade 6 for internal threads (from memory; the same limits are tabulated in ASME B1.13M)",
  },
  "iso-898-2": {
    author: "International Organization for Standardization",
    title: "Mechanical properties of fasteners made of carbon steel and alloy steel — Part 2: Nuts with specified property classes",
    publication: "ISO 898-2:2012",
    locator: "design principle: a nut of the property class matching the bolt is proportioned so that the bolt breaks before the threads strip (from memory)",
  },
  "sae-j429": {
    author: "SAE International",
    title: "Mechanical and Material Requirements for Externally Threaded Fasteners",
    publication: "SAE J429 (values as reproduced in Shigley's Mechanical Engineering Design, 9th ed., Table 8-9)",
    locator:
      "grades 2 (1/4–3/4 in: proof 55, tensile 74, yield 57 kpsi), 5 (1/4–1 in: 85, 120, 92 kpsi), 8 (1/4–1 1/2 in: 120, 150, 130 kpsi); specified minimum values; the standard starts at 1/4 in",
  },
  "astm-a574": {
    author: "ASTM International",
    title: "Standard Specification for Alloy Steel Socket-Head Cap Screws",
    publication: "ASTM A574 (edition of 2008 as reproduced in fastener technical data)",
    locator:
      "mechanical requirements, sizes 0.500 in and smaller: tensile 180 ksi, proof 140 ksi, yield (0.2 % offset) 153 ksi, all minimums; scope 0.060 to 4 in; stress areas per Handbook H28",
  },
  "en-1090-2": {
    author: "European Committee for Standardization (CEN)",
    title: "Execution of steel structures and aluminium structures — Part 2: Technical requirements for steel structures",
    publication: "EN 1090-2:2008+A1:2011",
    locator:
      "Table 18, slip factors of faying surfaces: class A 0.50 (blasted, loose rust removed), B 0.40 (blasted and spray-metallised or zinc-silicate coated), C 0.30 (wire-brushed or flame-cleaned), D 0.20 (as rolled); preload F_p,C = 0.7 f_ub A_s",
  },
  "rcsc-structural-joints": {
    author: "Research Council on Structural Connections",
    title: "Specification for Structural Joints Using ASTM A325 or A490 Bolts",
    publication: "RCSC, 1988 edition (later editions lower class A to 0.30, from memory)",
    locator: "slip coefficients: class A 0.33 (clean mill scale), class B 0.50 (blast-cleaned), class C 0.40 (hot-dip galvanised and roughened)",
  },
  "bickford-bolted-joints": {
    author: "J. H. Bickford, S. Nassar (eds.)",
    title: "Handbook of Bolts and Bolted Joints",
    publication: "Marcel Dekker, 1998",
    locator: "ch. 2, Table 1, nut factors K: bare steel 0.2, cadmium-plated dry 0.2, zinc-plated dry 0.295 (seen only as a quotation)",
  },
  "ifi-shear-rule": {
    author: "Industrial Fasteners Institute",
    title: "Shear strength of carbon steel fasteners: about 60 percent of the specified minimum tensile strength (an empirical guide)",
    publication: "IFI fastener engineering guidance, edition not confirmed; quoted in fastener-trade technical notes",
  },
  "roark-beams": {
    author: "W. C. Young, R. G. Budynas",
    title: "Roark's Formulas for Stress and Strain",
    publication: "McGraw-Hill, 7th ed., 2002",
    locator:
      "ch. 8, Table 8.1, straight beams under a transverse end load: cantilever (M_max = W l at the fixed end) and fixed at one end, guided at the other (M_max = W l/2 at both ends); case numbers from memory",
  },
  "aluminum-association-typical": {
    author: "The Aluminum Association",
    title: "Aluminum Standards and Data (typical mechanical properties)",
    publication: "The Aluminum Association (edition not confirmed; values as reproduced on alloy data sheets)",
    locator: "6061-T6 typical: tensile 310 MPa (45 ksi), yield 276 MPa (40 ksi), shear 207 MPa (30 ksi); typical values are not for design",
  },
  "astm-b221": {
    author: "ASTM International",
    title: "Standard Specification for Aluminum and Aluminum-Alloy Extruded Bars, Rods, Wire, Profiles, and Tubes",
    publication: "ASTM B221 (edition not confirmed; table as reproduced)",
    locator: "6061-T6, T6510, T6511, thickness up to 0.249 in: tensile ≥ 38 ksi (262 MPa), yield ≥ 35 ksi (241 MPa)",
  },
} as const satisfies Record<string, Source>;
