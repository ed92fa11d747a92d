import type { Source } from "./types.ts";

/** Bibliography entries used by calc/loads/index.ts and calc/fasteners.ts. */
export const LOADS_SOURCES = {
  "iso-898-1": {
    author: "International Organization for Standardization",
    title:
      "Mechanical properties of fasteners made of carbon steel and alloy steel — Part 1: Bolts, screws and studs with specified property classes — Coarse thread and fine pitch thread",
    publication: "ISO 898-1:2013 (earlier editions 1999 and 2009)",
    locator:
      "Table 3 (R_m, R_eL, R_p0.2, proof stress S_p); Table 4 (stress area A_s,nom and minimum ultimate tensile loads); stress-area formula A_s = (π/4)((d₂+d₃)/2)² (clause number not confirmed); scope: shear resistance is not specified",
  },
  "iso-261": {
    author: "International Organization for Standardization",
    title: "ISO general purpose metric screw threads — General plan",
    publication: "ISO 261:1998",
    locator: "coarse pitch for each nominal diameter",
  },
  "iso-68-1": {
    author: "International Organization for Standardization",
    title: "ISO general purpose screw threads — Basic profile — Part 1: Metric screw threads",
    publication: "ISO 68-1:1998",
    locator: "basic profile; height of the fundamental triangle H = (√3/2)·P",
  },
  "iso-724": {
    author: "International Organization for Standardization",
    title: "ISO general-purpose metric screw threads — Basic dimensions",
    publication: "ISO 724:1993",
    locator: "d₂ = d − 0.6495 P, d₁ = d − 1.0825 P",
  },
  "gb-t-16823-1": {
    author: "Standardization Administration of China",
    title: "Threaded fasteners — Stress area and bearing area",
    publication: "GB/T 16823.1-1997",
    locator: "table of tensile stress areas A_s (used here for M2 and M2.5 only)",
  },
  "en-1993-1-8": {
    author: "European Committee for Standardization (CEN)",
    title: "Eurocode 3: Design of steel structures — Part 1-8: Design of joints",
    publication: "EN 1993-1-8:2005",
    locator:
      "Table 3.4 (F_v,Rd = α_v f_ub A / γ_M2 with α_v = 0.6 or 0.5; F_t,Rd = k₂ f_ub A_s / γ_M2); §2.2 (γ_M2 = 1.25 recommended). The class-by-class α_v split is quoted from memory, consistent with published design tables",
  },
  "shigley-distortion-energy": {
    author: "R. G. Budynas, J. K. Nisbett",
    title: "Shigley's Mechanical Engineering Design",
    publication: "McGraw-Hill, 9th ed., 2011 (any recent edition)",
    locator: "failure theories chapter: distortion-energy (von Mises) theory, shear yield S_sy = S_y/√3 = 0.577 S_y (section number from memory)",
  },
  "shear-ultimate-ratio": {
    author: "Common practice (handbook rules of thumb; see also en-1993-1-8)",
    title: "Ultimate shear strength of steel estimated as a fixed fraction of its tensile strength",
    publication: "Spread in the literature: about 0.5 to 0.75 × R_m; 0.6 is the most quoted figure, 0.5 the lowest",
    locator: "0.5 is the lower Eurocode 3 thread-shear factor α_v (Table 3.4) and the conservative end of the spread",
  },
  "carvill-data-handbook": {
    author: "J. Carvill",
    title: "Mechanical Engineer's Data Handbook",
    publication: "Butterworth-Heinemann, 1993",
    locator: "§1.2.7 Stresses due to rotation: thin ring σ = ρv²; solid disk σ_t = σ_r = ρv²(3+ν)/8 at the centre",
  },
  "timoshenko-goodier": {
    author: "S. P. Timoshenko, J. N. Goodier",
    title: "Theory of Elasticity",
    publication: "McGraw-Hill, 3rd ed., 1970",
    locator: "Rotating disks of uniform thickness: σ_r(r), σ_θ(r) for solid and bored disks (§32, section number from memory)",
  },
  "roark-rotating-disks": {
    author: "W. C. Young, R. G. Budynas",
    title: "Roark's Formulas for Stress and Strain",
    publication: "McGraw-Hill, 7th ed., 2002",
    locator: "ch. 16, dynamic and temperature stresses: rotating disks (table and case numbers from memory)",
  },
  "safety-factor-practice": {
    author: "Common practice",
    title:
      "Safety factor n = strength / working stress: below 1 the part is expected to fail; below about 2 the margin is thin when the load is known only roughly",
    publication: "General machine-design convention; the thresholds are choices, not standard values",
  },
} as const satisfies Record<string, Source>;
