/**
 * How a bibliography entry reads on a chapter page (components/ui/source-text.ts): one full stop
 * after each part even when the part ends in "et al.", and real subscripts for the "x_y" the plain
 * text writes.
 */
import { describe, expect, it } from "vitest";
import { asSentence, sourceSentences, subscriptRuns } from "../../components/ui/source-text.ts";
import { SOURCES } from "../../calc/sources/index.ts";

describe("bibliography entries as sentences", () => {
  it("ends a part that already ends in a full stop with no second one", () => {
    expect(asSentence("P. P. Urone, R. Hinrichs et al.")).toBe("P. P. Urone, R. Hinrichs et al.");
    expect(asSentence("College Physics")).toBe("College Physics.");
    expect(asSentence("Is it safe?")).toBe("Is it safe?");
  });

  it("never writes two full stops in a row for any entry of the bibliography", () => {
    for (const source of Object.values(SOURCES)) {
      const { author, title, rest } = sourceSentences(source);
      expect(`${author} ${title} ${rest}`).not.toMatch(/\.\./);
    }
  });

  it("joins the publication and the locator into the last sentence", () => {
    expect(sourceSentences({ author: "A. Author", title: "A title", publication: "Press, 2001", locator: "p. 4" })).toEqual({
      author: "A. Author.",
      title: "A title.",
      rest: "Press, 2001, p. 4.",
      publication: "Press, 2001, ",
      locator: "p. 4.",
    });
  });

  it("leaves the locator empty when an entry has none", () => {
    expect(sourceSentences({ author: "A. Author", title: "A title", publication: "Press, 2001", locator: "" })).toMatchObject({
      rest: "Press, 2001.",
      publication: "Press, 2001.",
      locator: "",
    });
  });
});

describe("subscripts written x_y in plain text", () => {
  const sub = (text: string) =>
    subscriptRuns(text)
      .map((r) => (r.sub ? `<${r.text}>` : r.text))
      .join("");

  it.each([
    ["centripetal acceleration a_c = rω²", "centripetal acceleration a<c> = rω²"],
    ["conventional value of g_n", "conventional value of g<n>"],
    ["R_p0.2,min and R_m, then", "R<p0.2,min> and R<m>, then"],
    ["S_t = α y_{t−1} + (1 − α) S_{t−1}", "S<t> = α y<t−1> + (1 − α) S<t−1>"],
    ["I_xz = I'_xz + m x̄ z̄", "I<xz> = I'<xz> + m x̄ z̄"],
    ["K_v(RPM)", "K<v>(RPM)"],
    ["no subscript here", "no subscript here"],
  ])("sets %s with its subscripts", (text, expected) => {
    expect(sub(text)).toBe(expected);
  });

  it("keeps the text whole: the runs join back to the text less its markers", () => {
    const text = "F_v,Rd = α_v f_ub A / γ_M2";
    expect(
      subscriptRuns(text)
        .map((r) => r.text)
        .join(""),
    ).toBe("Fv,Rd = αv fub A / γM2");
  });
});
