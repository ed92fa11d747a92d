import type { Source } from "../source-type.ts";

/** Bibliography entries used by calc/heading.ts. */
export const HEADING_SOURCES = {} as const satisfies Record<string, Source>;
