/** Shapes the API returns for the network (regions and chapters); the web app reads the same types. */

export interface RegionView {
  id: number;
  name: string;
  /** Short code used in exports and URLs, e.g. "NR". */
  code: string;
  chapterCount: number;
}

export interface ChapterView {
  id: number;
  name: string;
  regionId: number;
  regionName: string;
  /** Day of the following month by which the chapter's monthly tally is due (1–28). */
  reportingDueDay: number;
  /** ISO date (YYYY-MM-DD) the chapter started. */
  activeFrom: string;
  /** ISO date the chapter closed, or null while active. */
  activeTo: string | null;
}
