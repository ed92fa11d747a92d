/**
 * Search over the calculators' fields, on the real registry: real queries and the field each must
 * find first; whole words only, so a nonsense word finds nothing.
 */
import { describe, expect, it } from "vitest";
import { CALCULATORS } from "../../calc/design/calculators.ts";
import { searchEntries } from "../../components/search/entries.ts";
import { excerptParts, fieldScore, rankFields, STRONG_MATCH, textMatches, words } from "../../components/search/rank.ts";

const entries = searchEntries(CALCULATORS);
const first = (query: string) => rankFields(entries, query)[0];

describe("the first field found", () => {
  it.each<{ query: string; label: string | RegExp; kind: string; url: RegExp }>([
    { query: "kv", label: "Motor Kv", kind: "input", url: /^chapters\/spin-up\/#spin-up-calculator-motorKv$/ },
    { query: "Kv", label: "Motor Kv", kind: "input", url: /#spin-up-calculator-motorKv$/ },
    { query: "counterweight", label: "Counterweight mass", kind: "input", url: /^chapters\/mass-layout\/#mass-calculator-counterweightMass$/ },
    { query: "burst", label: "Estimated burst speed", kind: "output", url: /^chapters\/rims\/#rim-calculator$/ },
    { query: "bias", label: "Sensor offset", kind: "input", url: /^chapters\/heading-drift\/#drift-calculator-bias$/ },
    { query: "LSB", label: "Resolution (1 LSB)", kind: "input", url: /^chapters\/acceleration\/#placement-calculator-step$/ },
    { query: "tip speed", label: "Tip speed", kind: "output", url: /^chapters\/rims\/#rim-calculator$/ },
  ])("$query finds $label", ({ query, label, kind, url }) => {
    const hit = first(query)!;
    expect(hit.entry.label).toMatch(label instanceof RegExp ? label : new RegExp(`^${label.replace(/[()]/g, "\\$&")}$`));
    expect(hit.entry.kind).toBe(kind);
    expect(hit.entry.url).toMatch(url);
    expect(hit.score).toBeGreaterThanOrEqual(STRONG_MATCH);
  });
});

describe("matching", () => {
  it("finds nothing for a word that is in no field", () => {
    expect(rankFields(entries, "xqzvwk")).toEqual([]);
    expect(rankFields(entries, "zz")).toEqual([]);
  });

  it("finds nothing for an empty query or one of punctuation only", () => {
    expect(rankFields(entries, "")).toEqual([]);
    expect(rankFields(entries, " ·/ ")).toEqual([]);
  });

  it("ranks an exact label above a symbol, a symbol above words of a label, and those above the help", () => {
    const entry = {
      kind: "input" as const,
      label: "Motor Kv",
      keys: ["motorKv", "kv"],
      unit: "rpm/V",
      help: "No-load speed per volt.",
      calculator: "",
      url: "",
    };
    const scores = ["motor kv", "kv", "motor", "volt"].map((q) => fieldScore(entry, q));
    expect(scores).toEqual([...scores].sort((a, b) => b - a));
    expect(new Set(scores).size).toBe(4);
  });

  it("takes a word's start from three letters on, never a letter or two", () => {
    const entry = { kind: "input" as const, label: "Counterweight mass", keys: [], unit: "", help: "", calculator: "", url: "" };
    expect(fieldScore(entry, "counterw")).toBeGreaterThan(0);
    expect(fieldScore(entry, "co")).toBe(0);
  });

  it("splits names in code and drops accents and punctuation", () => {
    expect(words("motorKv")).toEqual(["motor", "kv"]);
    expect(words("Resolution (1 LSB)")).toEqual(["resolution", "1", "lsb"]);
    expect(words("Poisson’s ratio")).toEqual(["poisson", "s", "ratio"]);
  });

  it("keeps a page only when its text holds every word of the query", () => {
    expect(textMatches("Rims and disks: hoop stress and burst speed", "burst speed")).toBe(true);
    expect(textMatches("The rim bursts near 37200 rpm", "burst")).toBe(true);
    expect(textMatches("x = e^(−1/d) with d the time constant", "xqzvwk")).toBe(false);
  });
});

describe("the field entries", () => {
  it("holds every input and choice of every calculator, each opening its calculator at the field", () => {
    const fields = CALCULATORS.reduce((n, c) => n + Object.keys(c.inputs).length + Object.keys(c.choices).length, 0);
    expect(entries.filter((e) => e.kind !== "output")).toHaveLength(fields);
    for (const e of entries.filter((x) => x.kind !== "output")) expect(e.url).toBe(`${e.calculatorUrl}-${e.keys[0]}`);
    for (const e of entries) expect(e.calculatorUrl).toMatch(/^chapters\/[\w-]+\/#[\w-]+$/);
  });

  it("lists units metric first, then US when different", () => {
    expect(entries.find((e) => e.url.endsWith("#rim-calculator-outerRadius"))?.unit).toBe("mm, in");
  });
});

describe("a page's excerpt", () => {
  const shown = (parts: { text: string; marked: boolean }[]) => parts.map((p) => (p.marked ? `[${p.text}]` : p.text)).join("");

  it("marks the query's words, and the words they start (from three letters on), not the punctuation around them", () => {
    expect(shown(excerptParts("The motor's Kv (rpm/V) sets the counterweights.", "kv counterw"))).toBe("The motor's [Kv] (rpm/V) sets the [counterweights].");
    expect(shown(excerptParts("a kvetch", "kv"))).toBe("a kvetch");
  });

  it("starts at the text's start when the first match fits, else a third of the excerpt before it, with … where it cuts", () => {
    const text = Array.from({ length: 100 }, (_, i) => `w${i}`).join(" ");
    expect(shown(excerptParts(text, "w20", 36))).toBe(`${Array.from({ length: 36 }, (_, i) => (i === 20 ? "[w20]" : `w${i}`)).join(" ")} …`);
    expect(shown(excerptParts(text, "w50", 36))).toBe(`… ${Array.from({ length: 36 }, (_, i) => (i + 38 === 50 ? "[w50]" : `w${i + 38}`)).join(" ")} …`);
    expect(shown(excerptParts(text, "w99", 36))).toBe(`… ${Array.from({ length: 13 }, (_, i) => (i + 87 === 99 ? "[w99]" : `w${i + 87}`)).join(" ")}`);
  });

  it("shows the start of a text that holds none of the words", () => {
    expect(shown(excerptParts("one two three", "zzz"))).toBe("one two three");
  });
});
