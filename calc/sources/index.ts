/**
 * The bibliography of calc/: every formula and constant names one of these keys, and every chapter
 * lists the keys it relies on in its frontmatter (an unknown key fails the build).
 */
import type { Source } from "./types.ts";
import { HEADING_SOURCES } from "./heading.ts";
import { MASS_SOURCES } from "./mass.ts";
import { LOADS_SOURCES } from "./loads.ts";
import { DRIVETRAIN_SOURCES } from "./drivetrain.ts";
import { WEAPON_SOURCES } from "./weapon.ts";
import { STEERING_SOURCES } from "./steering.ts";
import { JOINT_SOURCES } from "./joints.ts";

export type { Source };

export const SOURCES = {
  "cgpm-1901": {
    author: "Conférence générale des poids et mesures",
    title: "Declaration on the unit of mass and on the definition of weight; conventional value of g_n",
    publication: "Comptes rendus de la 3e CGPM, 1901",
    locator: "p. 70",
  },
  "nist-sp811": {
    author: "A. Thompson, B. N. Taylor",
    title: "Guide for the Use of the International System of Units (SI)",
    publication: "NIST Special Publication 811, 2008 edition",
    locator: "Appendix B, conversion factors",
  },
  "intl-yard-pound-1959": {
    author: "National standards laboratories of six countries",
    title: "International yard and pound agreement",
    publication: "1959 (yard = 0.9144 m, pound = 0.453 592 37 kg exactly)",
  },
  "openstax-college-physics": {
    author: "P. P. Urone, R. Hinrichs et al.",
    title: "College Physics",
    publication: "OpenStax, 2012",
    locator: "ch. 6, Uniform Circular Motion and Gravitation (centripetal acceleration a_c = rω²)",
  },
  "openstax-university-physics-1": {
    author: "W. Moebs, S. J. Ling, J. Sanny",
    title: "University Physics, Volume 1",
    publication: "OpenStax, 2016",
    locator: "§10.4 Moment of Inertia and Rotational Kinetic Energy; §6.3 Centripetal Force",
  },
  "newton-second-law": {
    author: "Any introductory mechanics text, e.g. OpenStax University Physics vol. 1",
    title: "Newton's second law in circular motion: F = m a_c = m ω² r",
    publication: "OpenStax, 2016",
    locator: "§6.3 Centripetal Force",
  },
  "sensor-quantisation": {
    author: "Common practice",
    title: "A digital sensor cannot report a change smaller than one count (its resolution) or its noise floor",
    publication: "Data-sheet convention for digital accelerometers (sensitivity in g per count, noise density)",
  },
  ...HEADING_SOURCES,
  ...MASS_SOURCES,
  ...LOADS_SOURCES,
  ...DRIVETRAIN_SOURCES,
  ...WEAPON_SOURCES,
  ...STEERING_SOURCES,
  ...JOINT_SOURCES,
} as const satisfies Record<string, Source>;

export type SourceKey = keyof typeof SOURCES;

/** True when `key` names an entry of the bibliography. */
export function isSourceKey(key: string): key is SourceKey {
  return Object.hasOwn(SOURCES, key);
}
