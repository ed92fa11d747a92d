import type { Source } from "../source-type.ts";

/** Bibliography entries used by calc/drivetrain.ts. */
export const DRIVETRAIN_SOURCES = {} as const satisfies Record<string, Source>;
