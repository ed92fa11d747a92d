/**
 * The radius and speed of a spinning part held by bolts, declared once for the fastener check and the
 * joint check. A module of its own so that neither check's declaration loads the other, and pages
 * that share calc/loads/common.ts do not carry it.
 */
import { rpmToRadPerSecond } from "../core/units.ts";

/**
 * The radius and speed of a spinning part held by bolts, as the fastener check and the joint check
 * both declare them (newton-second-law: F = mω²r).
 */
export const SPINNING_PART_INPUTS = {
  radius: {
    label: "Radius of the part",
    kind: "length",
    min: 0.001,
    max: 2,
    default: 0.07,
    urlKey: "r",
    help: "From the spin axis to the part's own centre of mass.",
  },
  angularSpeed: {
    label: "Speed",
    kind: "angularSpeed",
    min: rpmToRadPerSecond(1),
    max: rpmToRadPerSecond(100000),
    default: rpmToRadPerSecond(2400),
    urlKey: "rpm",
    help: "The top speed the part will see.",
  },
} as const;
