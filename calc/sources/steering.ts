import type { Source } from "./types.ts";

/** Bibliography entries used by calc/numerics/ode.ts and calc/steering/. */
export const STEERING_SOURCES = {
  "hairer-dopri5-code": {
    author: "E. Hairer, G. Wanner",
    title: "DOPRI5: explicit Runge–Kutta method of order 5(4) due to Dormand and Prince, with dense output; driver program dr_dopri5.f",
    publication: "Fortran code distributed with Solving Ordinary Differential Equations I, Université de Genève (version of 1996 and later)",
    locator:
      "HINIT starting step with h^iord·max(‖f0‖, ‖f'‖) = 0.01, iord = 5; step factors fac1 = 0.2, fac2 = 10, safe = 0.9; CONTD5 dense output; the driver's Arenstorf orbit: y(0) = (0.994, 0, 0, −2.00158510637908252240537862224), xend = 17.0652165601579625588917206249",
  },
  "dowell-jarratt-1971": {
    author: "M. Dowell, P. Jarratt",
    title: "A modified regula falsi method for computing the root of an equation",
    publication: "BIT Numerical Mathematics 11, 1971, pp. 168–174",
    locator: "the Illinois method: the function value at an end point kept twice in a row is halved",
  },
  "siegwart-autonomous-robots": {
    author: "R. Siegwart, I. R. Nourbakhsh, D. Scaramuzza",
    title: "Introduction to Autonomous Mobile Robots",
    publication: "2nd ed., MIT Press, 2011",
    locator:
      "ch. 3, mobile robot kinematics: the differential-drive robot, v = (v_r + v_l)/2, ω = (v_r − v_l)/(2l) with l the half track (section number from memory)",
  },
  "oppenheim-willsky-signals": {
    author: "A. V. Oppenheim, A. S. Willsky, with S. H. Nawab",
    title: "Signals and Systems",
    publication: "2nd ed., Prentice Hall, 1997",
    locator: "§3.3, Fourier series of the periodic square wave: a_0 = 2T₁/T, a_k = sin(kω₀T₁)/(kπ) (example number from memory)",
  },
  "franklin-powell-workman-digital-control": {
    author: "G. F. Franklin, J. D. Powell, M. L. Workman",
    title: "Digital Control of Dynamic Systems",
    publication: "3rd ed., Addison-Wesley, 1998",
    locator: "the zero-order hold: a sample-and-hold adds on average half a sample period of delay, T/2 (section from memory)",
  },
  "meriam-kraige-dynamics": {
    author: "J. L. Meriam, L. G. Kraige",
    title: "Engineering Mechanics: Dynamics",
    publication: "7th ed., Wiley, 2012",
    locator:
      "ch. 7, three-dimensional dynamics of rigid bodies: gyroscopic motion, steady precession M = I Ω p with spin axis normal to the precession axis; ch. 6 plane kinetics of rigid bodies (article numbers from memory)",
  },
  "khurmi-gupta-theory-of-machines": {
    author: "R. S. Khurmi, J. K. Gupta",
    title: "Theory of Machines",
    publication: "S. Chand, revised ed. (read in a textbook-companion copy)",
    locator:
      "ch. 14, gyroscopic couple and precessional motion: C = I·ω·ω_p; Ex. 14.2 (disc 150 mm, 5 kg, 1000 rpm, precession 60 rpm, bearings 100 mm apart: R_A = 116.5 N, R_B = 67.5 N), p. 485",
  },
  "pacejka-tyre-dynamics": {
    author: "H. B. Pacejka",
    title: "Tyre and Vehicle Dynamics",
    publication: "2nd ed., Butterworth-Heinemann (Elsevier), 2006",
    locator:
      "ch. 2 theoretical slip σ = −V_s/V_r; ch. 3 the brush model: isotropic combined slip, F = μF_z(3θσ − 3(θσ)² + (θσ)³) with θ = C/(3μF_z), full sliding at θσ ≥ 1, force opposite the slip speed (section numbers from memory)",
  },
} as const satisfies Record<string, Source>;
