// Types for the parts of psychrolib 1.1.1 (plain CommonJS, `module.exports = new
// Psychrometrics()`) that the tests use. Temperatures in °C and pressures in Pa
// once SetUnitSystem(SI) has been called; relative humidity as a fraction 0…1.
declare module "psychrolib" {
  interface Psychrolib {
    readonly IP: 1;
    readonly SI: 2;
    SetUnitSystem(unitSystem: 1 | 2): void;
    /** Dew-point temperature from dry-bulb temperature and relative humidity (0…1). */
    GetTDewPointFromRelHum(TDryBulb: number, RelHum: number): number;
    /** Saturation vapour pressure over water (above 0.01 °C) or ice (at and below). */
    GetSatVapPres(TDryBulb: number): number;
  }
  const psychrolib: Psychrolib;
  export = psychrolib;
}
