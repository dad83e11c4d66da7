/** umbracast as a library: the same computations the CLI offers, typed. */
export { InputError } from './errors.ts';
export { standardDeltaTModel, fixedDeltaTModel, type DeltaT, type DeltaTModel, type DeltaTSource } from './ephemeris/deltaT.ts';
export { isoSeconds, momentFromTT, momentFromUT, utDaysFromDate, dateFromDays, type Moment } from './ephemeris/time.ts';
export { subBodyPoint, greenwichApparentSiderealDeg, type LonLat } from './ephemeris/earth.ts';
export { findLunarEclipses, SUPPORTED_RANGE, type CatalogueOptions } from './eclipse/catalogue.ts';
export { danjon, chauvenet, shadowConvention, SHADOW_CONVENTIONS, type ShadowConvention, type ShadowConventionName } from './eclipse/conventions.ts';
export { CONTACT_ORDER, type ContactName } from './eclipse/contacts.ts';
export { sarosAt } from './eclipse/saros.ts';
export { ECLIPSE_KINDS, type EclipseKind, type LunarEclipse, type PhaseDurations } from './eclipse/types.ts';
export { catalogueDocument, eclipseRecord, CATALOGUE_SCHEMA, type CatalogueDocument, type EclipseRecord } from './outputs/catalogueRecord.ts';
export { catalogueCsv, catalogueJson, catalogueTable, CATALOGUE_FORMATS, type CatalogueFormat } from './outputs/catalogueFormats.ts';
