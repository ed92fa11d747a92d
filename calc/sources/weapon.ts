import type { Source } from "./types.ts";

/**
 * Bibliography entries used by calc/weapon/ (a spinning weapon in motion: gyroscopic loads, tipping
 * while turning, precession, the weapon shaft and its bearings, and what one hit does).
 */
export const WEAPON_SOURCES = {
  "meriam-kraige-dynamics": {
    author: "J. L. Meriam, L. G. Kraige",
    title: "Engineering Mechanics: Dynamics",
    publication: "7th ed., Wiley, 2012",
    locator:
      "ch. 7, gyroscopic motion: steady precession, M = I·Ω·p with the spin axis at 90° to the precession axis, direction from M = Ω × H (article number from memory); ch. 3, impact and the coefficient of restitution",
  },
  "khurmi-gupta-theory-of-machines": {
    author: "R. S. Khurmi, J. K. Gupta",
    title: "Theory of Machines",
    publication: "S. Chand, 14th ed., 2005 (edition from memory)",
    locator:
      "ch. 14, Gyroscopic Couple and Precessional Motion: C = I·ω·ω_P; Ex. 14.1 (p. 484, precession of a disc on a universal bearing), Ex. 14.2 (p. 485, bearing reactions from a gyroscopic couple), the ship-turbine and four-wheel-vehicle examples (gyroscopic and centrifugal couples shared by the wheels)",
  },
  "irodov-problems-general-physics": {
    author: "I. E. Irodov",
    title: "Problems in General Physics",
    publication: "Mir Publishers, Moscow, 1981",
    locator:
      "problem 1.289: a turbine whose axle is parallel to a locomotive's wheel axles; the gyroscopic couple 2πnIv/R is carried as a force pair on the rails",
  },
  "gillespie-vehicle-dynamics": {
    author: "T. D. Gillespie",
    title: "Fundamentals of Vehicle Dynamics",
    publication: "Society of Automotive Engineers, 1992",
    locator:
      "ch. 9, rollover: quasi-static rollover of a rigid vehicle, the lateral force m·a_y at the centre-of-mass height h against the weight's moment m·g·t/2 about the outer wheels (chapter from memory)",
  },
  "siegwart-autonomous-mobile-robots": {
    author: "R. Siegwart, I. R. Nourbakhsh, D. Scaramuzza",
    title: "Introduction to Autonomous Mobile Robots",
    publication: "2nd ed., MIT Press, 2011",
    locator:
      "§3.2, kinematic models: differential drive, turn rate from the two wheel speeds (the book writes l for HALF the wheel separation, θ̇ = (rφ̇₁ − rφ̇₂)/(2l); section from memory)",
  },
  "dudek-jenkin-mobile-robotics": {
    author: "G. Dudek, M. Jenkin",
    title: "Computational Principles of Mobile Robotics",
    publication: "2nd ed., Cambridge University Press, 2010",
    locator: "differential drive: ω = (V_r − V_l)/l and R = (l/2)(V_r + V_l)/(V_r − V_l), l the distance between the wheel centres (section from memory)",
  },
  "iso-281": {
    author: "International Organization for Standardization",
    title: "Rolling bearings — Dynamic load ratings and rating life",
    publication: "ISO 281:2007",
    locator:
      "basic rating life L10 = (C/P)^p million revolutions, p = 3 for ball and 10/3 for roller bearings; dynamic equivalent radial load P = X·F_r + Y·F_a (X = 1, Y = 0 for a purely radial load)",
  },
  "iso-76": {
    author: "International Organization for Standardization",
    title: "Rolling bearings — Static load ratings",
    publication: "ISO 76:2006",
    locator:
      "basic static load rating C0 (contact stress 4200 MPa for ball bearings other than self-aligning, 4000 MPa for roller bearings); static equivalent radial load P0 = X0·F_r + Y0·F_a with X0 = 0.6, Y0 = 0.5 for single-row radial ball bearings, and P0 = F_r when that is larger",
  },
  "bearing-static-safety-guide": {
    author: "Rolling-bearing manufacturers (general catalogues)",
    title: "Guideline values for the static safety factor s0 = C0/P0",
    publication: "General catalogues of rolling-bearing manufacturers; the same table is reproduced in distributors' technical pages",
    locator:
      "rotating bearings under pronounced shock loads: ball ≥ 1.5, 1.5, 2 and roller ≥ 2.5, 3, 4 for unimportant, normal and high performance requirements; non-rotating ball ≥ 1, roller ≥ 2; where the shock is not known, at least these values",
  },
  "shigley-rolling-bearings": {
    author: "R. G. Budynas, J. K. Nisbett",
    title: "Shigley's Mechanical Engineering Design",
    publication: "McGraw-Hill, 8th ed., 2008 (and later editions)",
    locator:
      "ch. 11, rolling-contact bearings: the load–life relation F·L^(1/a) = constant, a = 3 for ball and 10/3 for roller bearings; catalogue rating C10 = F_D·x_D^(1/a)",
  },
  "shigley-beam-deflection-table": {
    author: "R. G. Budynas, J. K. Nisbett",
    title: "Shigley's Mechanical Engineering Design",
    publication: "McGraw-Hill, 8th ed., 2008 (and later editions)",
    locator:
      "Table A-9, shear, moment and deflection of beams: 1 cantilever with end load; 6 simple supports, intermediate load; 8 simple supports, moment load; 10 simple supports, overhanging load",
  },
  "roark-beam-formulas": {
    author: "W. C. Young, R. G. Budynas",
    title: "Roark's Formulas for Stress and Strain",
    publication: "McGraw-Hill, 7th ed., 2002",
    locator:
      "Table 8.1, shear, moment, slope and deflection formulas for elastic straight beams: cases 1a (cantilever, concentrated end load), 1e (simply supported, concentrated intermediate load), 3e (simply supported, concentrated intermediate moment) (case letters from memory)",
  },
  "shigley-bending-torsion": {
    author: "R. G. Budynas, J. K. Nisbett",
    title: "Shigley's Mechanical Engineering Design",
    publication: "McGraw-Hill, 8th ed., 2008 (and later editions)",
    locator:
      "ch. 3, load and stress analysis: bending σ = Mc/I, torsion τ = Tr/J; round sections I = π(d⁴ − d_i⁴)/64, J = 2I; ch. 7, shafts: rotating bending is fully reversed, von Mises σ' = (σ² + 3τ²)^½",
  },
  "beer-johnston-dynamics": {
    author: "F. P. Beer, E. R. Johnston, P. J. Cornwell",
    title: "Vector Mechanics for Engineers: Dynamics",
    publication: "9th ed., McGraw-Hill, 2010",
    locator:
      "§13.13–13.14 direct central impact (Sample Problem 13.13, two railroad cars); §17.12 eccentric impact of a rigid body pinned at a point (sphere striking a hinged rod) (problem numbers from memory)",
  },
  "hibbeler-eccentric-impact": {
    author: "R. C. Hibbeler",
    title: "Engineering Mechanics: Dynamics",
    publication: "Pearson, 14th edition, 2016",
    locator: "§19.4 eccentric impact: angular momentum about the pin is conserved and the coefficient of restitution is taken along the line of impact",
  },
  "hyperphysics-work-energy": {
    author: "C. R. Nave, Georgia State University",
    title: "HyperPhysics: Work, energy and power",
    publication: "Online textbook, Department of Physics and Astronomy, Georgia State University",
    locator: "'for a straightline collision, the net work done is equal to the average force of impact times the distance traveled during the impact'",
  },
  "lalanne-mechanical-shock": {
    author: "C. Lalanne",
    title: "Mechanical Vibration and Shock, Volume II: Mechanical Shock",
    publication: "Hermes Penton Science, 2002",
    locator: "ch. 5, kinematics of simple shocks: the half-sine pulse A·sin(πt/τ) gives a velocity change 2Aτ/π, so its mean over the pulse is 2/π of its peak",
  },
  "linear-contact-model": {
    author: "Common practice",
    title:
      "A contact modelled as a linear spring: the force grows in proportion to the crush, so the work ½·F_peak·s makes the peak twice the work-average E/s; a mass on a linear spring gives a quarter-sine force rise in π/(2ω_n)",
    publication: "Elementary impact estimate (Hooke's law and the undamped oscillator); the real contact of metal parts is stiffer than linear as it closes",
  },
} as const satisfies Record<string, Source>;
