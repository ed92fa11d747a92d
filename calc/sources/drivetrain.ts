import type { Source } from "./types.ts";

/** Bibliography entries used by calc/motor.ts and calc/drivetrain/. */
export const DRIVETRAIN_SOURCES = {
  "motor-constants-wikipedia": {
    author: "Wikipedia contributors",
    title: "Motor constants",
    publication: "Wikipedia, the free encyclopedia (read in a mirrored copy)",
    locator: "Torque constant: K_T = τ/I_a = 60/(2π K_v(RPM)) = 1/K_v(SI); 1 N·m/A = 1 V·s",
  },
  "ctms-dc-motor-speed": {
    author: "D. Tilbury, W. Messner et al., University of Michigan and Carnegie Mellon University",
    title: "Control Tutorials for MATLAB and Simulink: DC Motor Speed, System Modeling",
    publication: "Online tutorial (read in secondary copies)",
    locator:
      "Physical setup and system equations (K_t = K_e in SI units); example J = 0.01 kg·m², b = 0.1 N·m·s, K = 0.01, R = 1 Ω, L = 0.5 H; 1 V step settles at 0.1 rad/s",
  },
  "hughes-drury-motors": {
    author: "A. Hughes, B. Drury",
    title: "Electric Motors and Drives: Fundamentals, Types and Applications",
    publication: "4th ed., Newnes (Elsevier), 2013",
    locator: "ch. 3, the d.c. motor: steady-state torque–speed line, no-load speed, stall current, peak power V²/(4R) (section not confirmed)",
  },
  "first-order-step-response": {
    author: "Common practice",
    title: "Step response of a first-order linear system: x(t) = x∞ + (x0 − x∞)·e^(−t/τ); 63.2 % at t = τ, 90 % at τ·ln 10",
    publication: "Any text on ordinary differential equations or system dynamics",
  },
  "dormand-prince-1980": {
    author: "J. R. Dormand, P. J. Prince",
    title: "A family of embedded Runge–Kutta formulae",
    publication: "Journal of Computational and Applied Mathematics 6 (1), 1980, pp. 19–26",
    locator: "the 5(4) pair with the first-same-as-last property (the tableau usually called DOPRI5)",
  },
  "hairer-norsett-wanner-1": {
    author: "E. Hairer, S. P. Nørsett, G. Wanner",
    title: "Solving Ordinary Differential Equations I: Nonstiff Problems",
    publication: "2nd revised ed., Springer, 1993",
    locator: "§II.4 automatic step size control; §II.6 dense output and the continuous extension of DOPRI5; event location by root-finding on the dense output",
  },
  "leine-stick-slip-1998": {
    author: "R. I. Leine, D. H. van Campen, A. de Kraker, L. van den Steen",
    title: "Stick-slip vibrations induced by alternate friction models",
    publication: "Nonlinear Dynamics 16, 1998, pp. 41–54",
    locator: "the switch model: separate stick and slip state equations with switching conditions, instead of a smoothed friction law",
  },
  "serway-beichner-5e": {
    author: "R. A. Serway, R. J. Beichner",
    title: "Physics for Scientists and Engineers",
    publication: "5th ed., Saunders College Publishing, 2000",
    locator: "§5.8 forces of friction (f_s ≤ μ_s n, f_k = μ_k n); Table 5.2, rubber on concrete μ_s = 1.0, μ_k = 0.8",
  },
  "erickson-power-electronics": {
    author: "R. W. Erickson, D. Maksimović",
    title: "Fundamentals of Power Electronics",
    publication: "2nd ed., Kluwer Academic, 2001",
    locator: "ch. 2, steady-state converter analysis: the buck converter's averaged conversion ratio M(D) = D; ideal converter input power equals output power",
  },
  "battery-thevenin-model": {
    author: "Common practice",
    title: "A battery cell as an open-circuit voltage behind an internal resistance: V = V_oc − I·R_int",
    publication: "The simplest equivalent-circuit cell model used in battery data sheets and pack sizing",
  },
  "gear-efficiency-model": {
    author: "Common practice",
    title:
      "Power through a reduction with efficiency η: output torque = η·G·input torque when the motor drives, input torque = output torque/(η·G) when the load drives",
    publication: "Drive-train sizing convention (constant efficiency, no speed or load dependence)",
  },
  "quadratic-air-drag": {
    author: "Common practice",
    title: "Aerodynamic drag torque on a spinning body taken proportional to the square of its speed, T = c·Ω²",
    publication: "Fully turbulent drag at a fixed shape (drag force ∝ v², acting at a fixed radius)",
  },
  "softschools-rotational-ke": {
    author: "Soft Schools",
    title: "Rotational Kinetic Energy Formula",
    publication: "Online physics formula pages, worked questions",
    locator: "Q1: I = 1.000×10⁻⁴ kg·m² at 760.0 rad/s, K = 28.88 J; Q2: I = 1500 kg·m² at 8.00 rad/s, K = 48 000 J",
  },
  "weapon-bite": {
    author: "Common practice",
    title: "Bite of a spinning weapon: the distance an opponent closes between two impactor passes, d = v·T/n with T = 2π/Ω",
    publication: "Combat-robot design convention (the trade term 'bite')",
  },
} as const satisfies Record<string, Source>;
