/** A town from the gazetteer, as forms and listings show it. */
export interface TownView {
  /** The gazetteer's id (GeoNames). */
  id: number;
  name: string;
  /** Country of the UK, or province of Ireland. */
  adminArea: string;
  country: 'GB' | 'IE';
  lat: number;
  lon: number;
}
