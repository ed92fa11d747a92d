/** A path inside the site ("chapters/spin-up/?…") as a link from any page, under the base the site is built with. */
export function siteUrl(path: string): string {
  return `${import.meta.env.BASE_URL.replace(/\/?$/, "/")}${path}`;
}
