/** The parts of a site that name it on one line. */
export interface SiteParts {
  readonly label: string;
  readonly addressLine1: string;
  readonly city: string;
}

/** "Stair hall, 14 Kiln Row, Ashford Vale": the site on one line, empty parts left out. */
export function siteLine(site: SiteParts): string {
  return [site.label, site.addressLine1, site.city]
    .map((part) => part.trim())
    .filter(Boolean)
    .join(', ');
}
