/** A survey photo as the screens show it (from the photos table, with its file addresses). */
export interface SurveyPhoto {
  id: number;
  section: string;
  caption: string | null;
  displayUrl: string;
  thumbUrl: string;
  widthPx: number;
  heightPx: number;
}
