/**
 * The name, condition and density of each material of the handbook's table: what a mass layout
 * needs to weigh a part, kept apart from the strengths, elastic constants and notes of
 * calc/materials/materials.ts (whose rows include these) so that a page that only weighs parts does
 * not carry the whole table. Each density's source is its row's `source` and `locator` there.
 * SI: kg/m³.
 */

/** What a part's mass needs to know about its material. */
export interface MaterialDensity {
  /** Short stable id, also used in URLs. */
  id: string;
  /** Material name, e.g. "AISI 4130 steel". */
  name: string;
  /** Heat treatment or form the numbers belong to. */
  condition: string;
  /** Name and condition short enough for a menu on a phone (at most 24 characters), e.g. "4130 steel, annealed". */
  menuName: string;
  /** ρ, mass density [kg/m³]. */
  density: number;
}

const G_PER_CM3 = 1000;

/** The materials in table order, with their densities. */
export const MATERIAL_DENSITIES = {
  "al-6061-t6": { id: "al-6061-t6", name: "Aluminium alloy 6061", condition: "T6 / T651", menuName: "Aluminium 6061-T6", density: 2.7 * G_PER_CM3 },
  "steel-4130-normalized": {
    id: "steel-4130-normalized",
    name: "AISI 4130 steel",
    condition: "normalized at 870 °C",
    menuName: "4130 steel, normalized",
    density: 7.85 * G_PER_CM3,
  },
  "steel-4130-annealed": {
    id: "steel-4130-annealed",
    name: "AISI 4130 steel",
    condition: "annealed at 865 °C",
    menuName: "4130 steel, annealed",
    density: 7.85 * G_PER_CM3,
  },
  "steel-4340-annealed": {
    id: "steel-4340-annealed",
    name: "AISI 4340 steel",
    condition: "annealed",
    menuName: "4340 steel, annealed",
    density: 7.85 * G_PER_CM3,
  },
  "steel-4340-normalized": {
    id: "steel-4340-normalized",
    name: "AISI 4340 steel",
    condition: "normalized (100 mm round)",
    menuName: "4340 steel, normalized",
    density: 7.85 * G_PER_CM3,
  },
  "steel-4340-qt650": {
    id: "steel-4340-qt650",
    name: "AISI 4340 steel",
    condition: "oil quenched from 800 °C, tempered at 650 °C (50 mm round)",
    menuName: "4340 steel, Q&T 650 °C",
    density: 7.85 * G_PER_CM3,
  },
  "tool-steel-s7-t205": {
    id: "tool-steel-s7-t205",
    name: "AISI S7 shock-resisting tool steel",
    condition: "fan-cooled from 940 °C, tempered at 205 °C (58 HRC)",
    menuName: "S7 tool steel, 58 HRC",
    density: 7.76 * G_PER_CM3,
  },
  "ti-6al-4v-annealed": {
    id: "ti-6al-4v-annealed",
    name: "Titanium alloy Ti-6Al-4V (Grade 5)",
    condition: "annealed bar",
    menuName: "Ti-6Al-4V, annealed",
    density: 4.43 * G_PER_CM3,
  },
  "uhmw-pe": {
    id: "uhmw-pe",
    name: "Ultra-high-molecular-weight polyethylene (UHMW-PE)",
    condition: "as supplied (sheet or bar)",
    menuName: "UHMW-PE",
    density: 0.94 * G_PER_CM3,
  },
  polycarbonate: {
    id: "polycarbonate",
    name: "Polycarbonate (PC)",
    condition: "molded / extruded sheet",
    menuName: "Polycarbonate (PC)",
    density: 1.2 * G_PER_CM3,
  },
} as const satisfies Record<string, MaterialDensity>;

export type MaterialId = keyof typeof MATERIAL_DENSITIES;

/** The material ids in table order. */
export const MATERIAL_IDS = Object.keys(MATERIAL_DENSITIES) as readonly MaterialId[];

/** True when `id` names a material of the table. */
export function isMaterialId(id: string): id is MaterialId {
  return Object.hasOwn(MATERIAL_DENSITIES, id);
}
