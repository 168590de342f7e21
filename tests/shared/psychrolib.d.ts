// The psychrolib package ships no types; only the calls the tests use are declared.
declare module 'psychrolib' {
  interface Psychrolib {
    readonly SI: number;
    readonly IP: number;
    SetUnitSystem(system: number): void;
    /** Dew point from dry bulb and RH as a fraction 0–1 (°C in SI). Over ice below the triple point. */
    GetTDewPointFromRelHum(tDryBulb: number, relHum: number): number;
    GetRelHumFromTDewPoint(tDryBulb: number, tDewPoint: number): number;
  }
  const psychrolib: Psychrolib;
  export default psychrolib;
}
