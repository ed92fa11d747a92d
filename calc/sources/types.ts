/** One entry of the bibliography (see sources.ts). */
export interface Source {
  /** Authors or issuing body. */
  author: string;
  /** Title of the work. */
  title: string;
  /** Publisher, edition and year as usually cited. */
  publication: string;
  /** Where in the work (section, table, clause), when one place is meant. */
  locator?: string;
}
