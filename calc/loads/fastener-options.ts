/**
 * The fastener menus alone: the ISO metric and Unified inch sizes and the ISO 898-1, SAE J429 and
 * ASTM A574 grades a calculator offers, as values and labels. Kept apart from the tables and their
 * lookups (calc/loads/fasteners.ts, calc/loads/inch-fasteners.ts, which re-export these) so that a
 * page can draw its menus without loading the data behind them.
 */
import type { ChoiceOption } from "../core/choices.ts";

/** Sizes of ISO metric coarse thread this module knows, smallest first. */
export const THREAD_SIZE_OPTIONS = [
  { value: "M2", label: "M2 × 0.4" },
  { value: "M2.5", label: "M2.5 × 0.45" },
  { value: "M3", label: "M3 × 0.5" },
  { value: "M4", label: "M4 × 0.7" },
  { value: "M5", label: "M5 × 0.8" },
  { value: "M6", label: "M6 × 1" },
  { value: "M8", label: "M8 × 1.25" },
  { value: "M10", label: "M10 × 1.5" },
  { value: "M12", label: "M12 × 1.75" },
] as const satisfies readonly ChoiceOption[];

export type ThreadSize = (typeof THREAD_SIZE_OPTIONS)[number]["value"];

/** Steel property classes of ISO 898-1 this module knows. */
export const PROPERTY_CLASS_OPTIONS = [
  { value: "4.6", label: "4.6 (low-carbon)" },
  { value: "8.8", label: "8.8 (Q&T)" },
  { value: "10.9", label: "10.9 (Q&T)" },
  { value: "12.9", label: "12.9 (Q&T alloy)" },
] as const satisfies readonly ChoiceOption[];

export type PropertyClassId = (typeof PROPERTY_CLASS_OPTIONS)[number]["value"];

/** Unified inch sizes this module knows, smallest first: the numbered machine-screw sizes and 1/4 to 3/8 in. */
export const INCH_THREAD_SIZE_OPTIONS = [
  { value: "#2-56", label: "#2-56 UNC" },
  { value: "#4-40", label: "#4-40 UNC" },
  { value: "#6-32", label: "#6-32 UNC" },
  { value: "#8-32", label: "#8-32 UNC" },
  { value: "#10-24", label: "#10-24 UNC" },
  { value: "#10-32", label: "#10-32 UNF" },
  { value: "1/4-20", label: "1/4-20 UNC" },
  { value: "5/16-18", label: "5/16-18 UNC" },
  { value: "3/8-16", label: "3/8-16 UNC" },
] as const satisfies readonly ChoiceOption[];

export type InchThreadSize = (typeof INCH_THREAD_SIZE_OPTIONS)[number]["value"];

/**
 * Inch bolt grades this module knows, with menu names short enough for a phone: SAE J429 grade 2
 * (low or medium carbon steel), 5 (medium carbon, quenched and tempered), 8 (alloy steel, quenched
 * and tempered), and the ASTM A574 alloy steel socket-head cap screw.
 */
export const INCH_GRADE_OPTIONS = [
  { value: "sae-2", label: "SAE J429 grade 2" },
  { value: "sae-5", label: "SAE J429 grade 5" },
  { value: "sae-8", label: "SAE J429 grade 8" },
  { value: "a574", label: "ASTM A574 socket head" },
] as const satisfies readonly ChoiceOption[];

export type InchGradeId = (typeof INCH_GRADE_OPTIONS)[number]["value"];

/** Every size a calculator can offer: the ISO metric coarse sizes, then the Unified inch sizes. */
export const FASTENER_SIZE_OPTIONS: readonly ChoiceOption<ThreadSize | InchThreadSize>[] = [...THREAD_SIZE_OPTIONS, ...INCH_THREAD_SIZE_OPTIONS];

export type FastenerSizeId = ThreadSize | InchThreadSize;

/** Every grade a calculator can offer: the ISO 898-1 property classes, then the inch grades. */
export const FASTENER_GRADE_OPTIONS: readonly ChoiceOption<PropertyClassId | InchGradeId>[] = [...PROPERTY_CLASS_OPTIONS, ...INCH_GRADE_OPTIONS];

export type FastenerGradeId = PropertyClassId | InchGradeId;
