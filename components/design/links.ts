/**
 * Between a design and the calculators: the chapter that edits each section, and the query string
 * that opens that calculator prefilled with the section's values.
 */
import type { Design, DesignSection } from "../../calc/design/design.ts";
import { accelerometerPlacementInputs } from "../../calc/rotation/rotation.ts";
import { headingDriftInputs } from "../../calc/heading/drift-budget.ts";
import type { UnitSystem } from "../../calc/core/units.ts";
import { permalinkQuery } from "../calc-ui/permalink.ts";
import { drivetrainInputs, DRIVE_TYPE_URL_KEY } from "../../calc/drivetrain/inputs.ts";
import type { FastenerCheckInput, RimCheckInput } from "../../calc/loads/index.ts";
import { fastenerLink } from "../loads/fastener-model.ts";
import { rimLink, CUSTOM_MATERIAL } from "../loads/rim-model.ts";
import { encodeLayout } from "../../calc/mass/layout-text.ts";
import { massBalanceInputs } from "../../calc/mass/mass-balance.ts";
import { formatNumber, fromSI } from "../../calc/core/units.ts";

/** The chapter (slug) whose calculator edits each section. */
export const SECTION_CHAPTER: Record<DesignSection, string> = {
  placement: "acceleration",
  headingDrift: "heading-drift",
  mass: "mass-layout",
  fasteners: "fasteners",
  rims: "rims",
  drivetrain: "spin-up",
};

/** Element id of each chapter's calculator (the link's anchor). */
const ANCHOR: Record<DesignSection, string> = {
  placement: "placement-calculator",
  headingDrift: "drift-calculator",
  mass: "mass-calculator",
  fasteners: "fastener-calculator",
  rims: "rim-calculator",
  drivetrain: "spin-up-calculator",
};

/**
 * Path and query (relative to the site's base) that open the calculator for a section, prefilled
 * with the design's values; for list sections, the item at `index`. Null when the section is empty.
 */
export function calculatorLink(design: Design, section: DesignSection, index: number | null, system: UnitSystem): string | null {
  const path = `chapters/${SECTION_CHAPTER[section]}/`;
  let query: string | null = null;
  switch (section) {
    case "placement":
      query = design.placement ? permalinkQuery(accelerometerPlacementInputs, design.placement, system) : null;
      break;
    case "headingDrift":
      query = design.headingDrift ? permalinkQuery(headingDriftInputs, design.headingDrift, system) : null;
      break;
    case "fasteners": {
      const entry = design.fasteners?.[index ?? 0];
      query = entry ? fastenerLink(entry as FastenerCheckInput, system) : null;
      break;
    }
    case "rims": {
      const entry = design.rims?.[index ?? 0];
      query = entry ? rimLink(entry as RimCheckInput, CUSTOM_MATERIAL, system) : null;
      break;
    }
    case "drivetrain":
      query = design.drivetrain
        ? `${permalinkQuery(drivetrainInputs, design.drivetrain as unknown as Record<string, number>, system)}&${DRIVE_TYPE_URL_KEY}=${design.drivetrain.driveType}`
        : null;
      break;
    case "mass": {
      const mass = design.mass;
      if (!mass) break;
      const unit = system === "us" ? "in" : "mm";
      const points = mass.candidates
        .map((p) => `${formatNumber(fromSI(p.x, unit), 6).replace("−", "-")},${formatNumber(fromSI(p.y, unit), 6).replace("−", "-")}`)
        .join(";");
      const params = new URLSearchParams(permalinkQuery(massBalanceInputs, mass.scalars, system));
      params.set("l", encodeLayout(mass.parts));
      if (points) {
        params.set("pts", points);
        params.set("cw", "p");
      }
      query = params.toString().replace(/%2F/g, "/").replace(/%3A/gi, ":").replace(/%7E/gi, "~").replace(/%2C/gi, ",").replace(/%3B/gi, ";");
      break;
    }
    default:
      query = null;
  }
  return query === null ? path : `${path}?${query}#${ANCHOR[section]}`;
}
