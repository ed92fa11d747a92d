import type { Source } from "../source-type.ts";

/** Bibliography entries used by calc/mass.ts. */
export const MASS_SOURCES = {} as const satisfies Record<string, Source>;
