/**
 * The README a newcomer starts from: it lists every chapter by its title, shows an image that
 * exists, and gives running and testing as two separate commands.
 */
import { describe, expect, it } from "vitest";
import { existsSync, readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";

const root = fileURLToPath(new URL("../../", import.meta.url));
const readme = readFileSync(join(root, "README.md"), "utf8");
const contentDir = join(root, "content/chapters");
const titles = readdirSync(contentDir)
  .filter((f) => f.endsWith(".mdx"))
  .map((f) => /^title:\s*"?(.*?)"?\s*$/m.exec(readFileSync(join(contentDir, f), "utf8"))![1]!);

describe("the README", () => {
  it.each(titles)("lists the chapter “%s”", (title) => {
    expect(readme).toContain(`- ${title}\n`);
  });

  it("shows only images that are in the repository", () => {
    const images = [...readme.matchAll(/!\[[^\]]*\]\(([^)]+)\)/g)].map((m) => m[1]!);
    expect(images.length).toBeGreaterThan(0);
    for (const image of images) expect(existsSync(join(root, image)), image).toBe(true);
  });

  it("gives running and testing as two commands, each in its own block", () => {
    const blocks = [...readme.matchAll(/```sh\n([\s\S]*?)```/g)].map((m) => m[1]!.trim());
    expect(blocks).toContain("npm install && npm start");
    expect(blocks).toContain("npm test");
  });
});
