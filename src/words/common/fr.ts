/**
 * Mots communs en français : Intl écrit les nombres, les durées et les dates ;
 * ici, le reste. Typographie française : espace insécable avant les deux-points
 * et le point-virgule. Country names from i18n-iso-countries except where
 * prose uses a shorter form.
 */
import type { CommonWords } from '../common.ts';

const NBSP = '\u00a0';

export const COMMON_FRENCH: CommonWords = {
  locale: 'fr',
  numerals: { digits: 'ascii', decimalSign: ',' },
  predictions: `Prévisions${NBSP}: la météo et l’horizon local décident de ce que l’on verra.`,
  durationUnits: {
    long: { hour: `${NBSP}h`, minute: `${NBSP}min` },
    compact: { hour: 'h', minute: 'min' },
  },
  and: 'et',
  punctuation: { colon: `${NBSP}: `, semicolon: `${NBSP}; ` },
  hemispheres: { north: 'N', south: 'S', east: 'E', west: 'O' },
  countryNames: {
    US: 'États-Unis',
    CF: 'Centrafrique',
    CD: 'RD Congo',
    CG: 'Congo',
    TZ: 'Tanzanie',
    CZ: 'Tchéquie',
    CI: 'Côte d’Ivoire',
    SZ: 'Eswatini',
    VA: 'Vatican',
  },
  continents: {
    Africa: 'l’Afrique', Antarctica: 'l’Antarctique', Asia: 'l’Asie', Europe: 'l’Europe', 'North America': 'l’Amérique du Nord', Oceania: 'l’Océanie', 'South America': 'l’Amérique du Sud',
  },
  mapAreas: {
    AFRICA: 'AFRIQUE', EUROPE: 'EUROPE', ASIA: 'ASIE', 'NORTH AMERICA': 'AMÉRIQUE DU NORD', 'SOUTH AMERICA': 'AMÉRIQUE DU SUD', AUSTRALIA: 'AUSTRALIE', ANTARCTICA: 'ANTARCTIQUE',
    'Pacific Ocean': 'Océan Pacifique', 'Atlantic Ocean': 'Océan Atlantique', 'Indian Ocean': 'Océan Indien',
  },
  credits: { basemap: `Fond de carte${NBSP}: Natural Earth via world-atlas (domaine public)`, places: `Lieux${NBSP}: GeoNames (CC BY 4.0)` },
  deltaTModel: {
    builtIn: (first, last, forecastTo) => `observé ${first}–${last}, prévision jusqu’en ${forecastTo}, Espenak–Meeus au-delà`,
    fixed: (seconds) => `fixe, ${seconds}${NBSP}s (fourni par l’utilisateur)`,
  },
  deltaTSources: { observed: 'observé', forecast: 'prévision', historical: 'historique', 'long-term': 'long terme', user: 'fourni par l’utilisateur' },
  clock: {
    locale: 'fr',
    julianBeside: (julianDate) => ` (julien${NBSP}: ${julianDate})`,
    dayMark: (days) => ` ${days > 0 ? '+' : '−'}${Math.abs(days)}${NBSP}j`,
    until: (label, lastTime) => `${label} jusqu’à ${lastTime}`,
    then: ', puis ',
  },
};
