import type { Source } from "../source-type.ts";

/** Bibliography entries used by calc/loads.ts. */
export const LOADS_SOURCES = {} as const satisfies Record<string, Source>;
