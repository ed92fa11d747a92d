// Plain `tsc` cannot read .astro files (the Astro language tools can); this lets .ts files that
// re-export Astro components type-check.
declare module "*.astro" {
  const Component: (props: Record<string, unknown>) => unknown;
  export default Component;
}
