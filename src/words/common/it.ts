/**
 * Parole comuni in italiano: numeri, durate e date li scrive Intl; qui il
 * resto. Country names from i18n-iso-countries except where prose uses a
 * shorter form.
 */
import type { CommonWords } from '../common.ts';

export const COMMON_ITALIAN: CommonWords = {
  locale: 'it',
  numerals: { digits: 'ascii', decimalSign: ',' },
  predictions: 'Sono previsioni: ciò che si vedrà dipende dal meteo e dall’orizzonte locale.',
  durationUnits: {
    long: { hour: ' h', minute: ' min' },
    compact: { hour: 'h', minute: 'min' },
  },
  and: 'e',
  // "ed" before a word starting with e (the euphonic d, common practice in Italian prose): "Africa ed Europa".
  andBefore: (item) => (/^[eEéÉ]/.test(item) ? 'ed' : 'e'),
  punctuation: { colon: ': ', semicolon: '; ' },
  hemispheres: { north: 'N', south: 'S', east: 'E', west: 'O' },
  countryNames: {
    US: 'Stati Uniti',
    TW: 'Taiwan',
    MM: 'Myanmar',
    PS: 'Palestina',
  },
  continents: {
    Africa: 'Africa', Antarctica: 'Antartide', Asia: 'Asia', Europe: 'Europa', 'North America': 'America del Nord', Oceania: 'Oceania', 'South America': 'America del Sud',
  },
  mapAreas: {
    AFRICA: 'AFRICA', EUROPE: 'EUROPA', ASIA: 'ASIA', 'NORTH AMERICA': 'AMERICA DEL NORD', 'SOUTH AMERICA': 'AMERICA DEL SUD', AUSTRALIA: 'AUSTRALIA', ANTARCTICA: 'ANTARTIDE',
    'Pacific Ocean': 'Oceano Pacifico', 'Atlantic Ocean': 'Oceano Atlantico', 'Indian Ocean': 'Oceano Indiano',
  },
  credits: { basemap: 'Mappa di base: Natural Earth tramite world-atlas (pubblico dominio)', places: 'Luoghi: GeoNames (CC BY 4.0)' },
  deltaTModel: {
    builtIn: (first, last, forecastTo) => `osservato ${first}–${last}, previsione fino al ${forecastTo}, Espenak–Meeus oltre`,
    fixed: (seconds) => `fisso, ${seconds} s (indicato dall’utente)`,
  },
  deltaTSources: { observed: 'osservato', forecast: 'previsione', historical: 'storico', 'long-term': 'lungo termine', user: 'indicato dall’utente' },
  clock: {
    locale: 'it',
    julianBeside: (julianDate) => ` (giuliano: ${julianDate})`,
    dayMark: (days) => ` ${days > 0 ? '+' : '−'}${Math.abs(days)} ${Math.abs(days) === 1 ? 'giorno' : 'giorni'}`,
    until: (label, lastTime) => `${label} fino alle ${lastTime}`,
    then: ', poi ',
  },
};
