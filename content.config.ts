import { defineCollection } from "astro:content";
import { glob } from "astro/loaders";
import { z } from "astro/zod";
import { isSourceKey } from "./calc/sources/index.ts";

/** One chapter of the handbook: an MDX file in content/chapters/. */
const chapters = defineCollection({
  loader: glob({ pattern: "*.mdx", base: "./content/chapters" }),
  schema: z.object({
    /** Title shown in the page heading, the navigation and the browser tab. */
    title: z.string().min(3),
    /** One sentence for the home page, the chapter list and the page's meta description. */
    description: z.string().min(10).max(300),
    /** Position in the chapter list (1 first). */
    order: z.number().int().positive(),
    /** Short title for the navigation (defaults to `title`). */
    navTitle: z.string().optional(),
    /** Bibliography keys from calc/sources.ts that the chapter relies on; an unknown key fails the build. */
    sources: z
      .array(z.string())
      .min(1)
      .superRefine((keys, ctx) => {
        for (const key of keys) {
          if (!isSourceKey(key)) ctx.addIssue({ code: "custom", message: `unknown source key "${key}": add it to calc/sources.ts or fix the spelling` });
        }
      }),
    /** True when the chapter embeds a calculator (an island); false pages ship no JavaScript. */
    calculator: z.boolean().default(false),
  }),
});

export const collections = { chapters };
