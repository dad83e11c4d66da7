/**
 * Gemeinsame Wörter auf Deutsch: Zahlen, Dauern und Daten schreibt Intl; hier
 * steht der Rest. Country names from i18n-iso-countries except where prose
 * uses a shorter form.
 */
import type { CommonWords } from '../common.ts';

export const COMMON_GERMAN: CommonWords = {
  locale: 'de',
  numerals: { digits: 'ascii', decimalSign: ',' },
  predictions: 'Vorhersagen: Was zu sehen ist, entscheiden Wetter und örtlicher Horizont.',
  durationUnits: {
    long: { hour: ' Std.', minute: ' Min.' },
    compact: { hour: 'h', minute: 'min' },
  },
  and: 'und',
  punctuation: { colon: ': ', semicolon: '; ' },
  hemispheres: { north: 'N', south: 'S', east: 'O', west: 'W' },
  countryNames: {
    US: 'USA',
    GB: 'Großbritannien',
    RU: 'Russland',
    SY: 'Syrien',
    TZ: 'Tansania',
    CD: 'DR Kongo',
    CZ: 'Tschechien',
    PS: 'Palästina',
    MD: 'Moldau',
    BN: 'Brunei',
  },
  continents: {
    Africa: 'Afrika', Antarctica: 'Antarktika', Asia: 'Asien', Europe: 'Europa', 'North America': 'Nordamerika', Oceania: 'Ozeanien', 'South America': 'Südamerika',
  },
  mapAreas: {
    AFRICA: 'AFRIKA', EUROPE: 'EUROPA', ASIA: 'ASIEN', 'NORTH AMERICA': 'NORDAMERIKA', 'SOUTH AMERICA': 'SÜDAMERIKA', AUSTRALIA: 'AUSTRALIEN', ANTARCTICA: 'ANTARKTIKA',
    'Pacific Ocean': 'Pazifischer Ozean', 'Atlantic Ocean': 'Atlantischer Ozean', 'Indian Ocean': 'Indischer Ozean',
  },
  credits: { basemap: 'Grundkarte: Natural Earth über world-atlas (gemeinfrei)', places: 'Orte: GeoNames (CC BY 4.0)' },
  deltaTModel: {
    builtIn: (first, last, forecastTo) => `beobachtet ${first}–${last}, Prognose bis ${forecastTo}, danach Espenak–Meeus`,
    fixed: (seconds) => `fest, ${seconds} s (vom Nutzer angegeben)`,
  },
  deltaTSources: { observed: 'beobachtet', forecast: 'Prognose', historical: 'historisch', 'long-term': 'Langzeitmodell', user: 'vom Nutzer angegeben' },
  clock: {
    locale: 'de',
    julianBeside: (julianDate) => ` (julianisch: ${julianDate})`,
    dayMark: (days) => ` ${days > 0 ? '+' : '−'}${Math.abs(days)} ${Math.abs(days) === 1 ? 'Tag' : 'Tage'}`,
    until: (label, lastTime) => `${label} bis ${lastTime}`,
    then: ', dann ',
  },
};
