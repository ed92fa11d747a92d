import type { Source } from "./types.ts";

/** Bibliography entries used by calc/mass.ts and calc/materials.ts. */
export const MASS_SOURCES = {
  "iso-21940-11": {
    author: "International Organization for Standardization",
    title: "Mechanical vibration — Rotor balancing — Part 11: Procedures and tolerances for rotors with rigid behaviour",
    publication: "ISO 21940-11:2016 (replaces ISO 1940-1:2003; US equivalent ANSI S2.19)",
    locator: "Table 1, balance quality grades G 0.4 to G 4000; G = e_per·Ω [mm/s]; U_per = e_per·m",
  },
  "bloch-geitner-machinery-maintenance": {
    author: "H. P. Bloch, F. K. Geitner",
    title: "Machinery Component Maintenance and Repair (Practical Machinery Management for Process Plants, vol. 3)",
    publication: "Gulf Publishing",
    locator: "Table 6-5 (balance quality grades per ISO 1940 and ANSI S2.19) and Fig. 6-33 notes (half of U_per per plane for two correction planes)",
  },
  "energy-tech-balancing-example": {
    author: "Energy-Tech magazine",
    title: "Article on rotor balance tolerances (id 18389): U_per = G·6.015·W/N in oz·in",
    publication: "Energy-Tech, online trade journal",
    locator: "p. 3 (imperial formula) and p. 4 (worked example: 1000 lb rotor, 15 000 rpm, G 2.5 → 1.0 oz·in)",
  },
  "oxford-concise-mathematics": {
    author: "C. Clapham, J. Nicholson",
    title: "The Concise Oxford Dictionary of Mathematics",
    publication: "Oxford University Press",
    locator: "Appendix 3, Table of moments of inertia",
  },
  "mathmos-moments-of-inertia": {
    author: "mathmos",
    title: "Moments of inertia of common bodies",
    publication: "mathmos online data pages",
    locator: "table moi1: annulus with radii b < a, ½M(a² + b²); rod of length 2a about its centre, ⅓Ma²",
  },
  "web-formulas-moment-of-inertia": {
    author: "Web-Formulas",
    title: "Moment of Inertia",
    publication: "Web-Formulas online formula collection",
    locator:
      "table of bodies: particle Md², ring MR², rectangular plate M(L² + W²)/12, bar ML²/12 and ML²/3, cylinder about a diameter through its centre MR²/4 + ML²/12",
  },
  "young-freedman-university-physics": {
    author: "H. D. Young, R. A. Freedman",
    title: "University Physics",
    publication: "14th ed., Pearson",
    locator: "Table 9.2, moments of inertia of various bodies; §9.5 parallel-axis theorem",
  },
  "parallel-axis-theorem": {
    author: "Any introductory mechanics text, e.g. OpenStax University Physics vol. 1",
    title: "Parallel-axis theorem I = I_cm + m d², and its product-of-inertia form I_xz = I'_xz + m x̄ z̄",
    publication: "OpenStax, 2016",
    locator: "§10.5 Calculating Moments of Inertia (parallel-axis theorem)",
  },
  "centre-of-mass": {
    author: "Any introductory mechanics text, e.g. OpenStax University Physics vol. 1",
    title: "Centre of mass of a system of particles: r_cm = Σ m_j r_j / Σ m_j",
    publication: "OpenStax, 2016",
    locator: "§9.6 Center of Mass",
  },
  "rigid-rotor-unbalance": {
    author: "Common practice in rotor dynamics (e.g. any machine-dynamics text on balancing)",
    title: "Static unbalance U = M·e, its rotating force F = U·ω², couple unbalance from the products of inertia, and two-plane correction",
    publication: "Standard rigid-rotor balancing relations; ISO 21940-11 uses the same definitions of static and couple unbalance",
  },
  "substech-materials": {
    author: "SubsTech (Substances and Technologies)",
    title: "Aluminum alloy 6061 (UNS A96061): properties",
    publication: "SubsTech online materials database, CC BY-NC",
    locator: "tempers T6, T651: tensile strength 310 MPa, yield strength 276 MPa, density 2.70×10³ kg/m³",
  },
  "asm-matweb-datasheets": {
    author: "ASM Aerospace Specification Metals, hosted by MatWeb",
    title: "Material data sheets: AISI 4130 steel, AISI 4340 steel, Ti-6Al-4V (Grade 5), aluminium 6061-T6",
    publication: "MatWeb online material property database",
    locator: "one data sheet per alloy and condition (named in each material row)",
  },
  "matweb-polymer-overview": {
    author: "MatWeb",
    title: "Category overview: Polycarbonate, Molded",
    publication: "MatWeb online material property database",
    locator: "average density 1.20 g/cc over 759 grades",
  },
  "callister-integrated-3e": {
    author: "W. D. Callister, D. G. Rethwisch",
    title: "Fundamentals of Materials Science and Engineering: An Integrated Approach",
    publication: "3rd ed., Wiley, 2008",
    locator: "Appendix B: Table B.1 density, B.2 modulus, B.3 Poisson's ratio, B.4 tensile and yield strength, B.5 (polymer strength taken as yield)",
  },
  "s7-nominal-properties-table": {
    author: "A steel distributor's technical article on AISI S7 (secondary reproduction)",
    title: "AISI S7 shock-resisting tool steel: nominal room-temperature properties after tempering",
    publication: "Trade article reproducing a tool-steel handbook table (primary source believed to be the ASM Handbook tool-steel tables; unconfirmed)",
    locator: "rows for fan cooling from 940 °C, tempered 205 °C (58 HRC) and 315 °C (55 HRC); density 7.76 g/cm³",
  },
} as const satisfies Record<string, Source>;
