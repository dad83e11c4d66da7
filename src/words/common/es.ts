/**
 * Palabras comunes en español: los números, las duraciones y las fechas los
 * escribe Intl; aquí, lo demás. Reviewed wording; country names from
 * i18n-iso-countries except where prose uses a shorter form.
 */
import type { CommonWords } from '../common.ts';

/** "y" becomes "e" before a word that starts with the sound i ("España e Italia"), not before "hie-" ("y Hierro"). */
const andBefore = (item: string) => (/^h?i(?![aeiouáéó])/i.test(item) ? 'e' : 'y');

export const COMMON_SPANISH: CommonWords = {
  locale: 'es',
  numerals: { digits: 'ascii', decimalSign: ',' },
  predictions: 'Son predicciones: lo que se vea dependerá del tiempo y del horizonte local.',
  durationUnits: {
    long: { hour: ' h', minute: ' min' },
    compact: { hour: 'h', minute: 'min' },
  },
  and: 'y',
  andBefore,
  punctuation: { colon: ': ', semicolon: '; ' },
  hemispheres: { north: 'N', south: 'S', east: 'E', west: 'O' },
  countryNames: {
    CD: 'República Democrática del Congo',
    KR: 'Corea del Sur',
    KP: 'Corea del Norte',
    LA: 'Laos',
    SY: 'Siria',
    BN: 'Brunéi',
    CZ: 'Chequia',
    VA: 'Ciudad del Vaticano',
  },
  continents: {
    Africa: 'África', Antarctica: 'la Antártida', Asia: 'Asia', Europe: 'Europa', 'North America': 'América del Norte', Oceania: 'Oceanía', 'South America': 'América del Sur',
  },
  mapAreas: {
    AFRICA: 'ÁFRICA', EUROPE: 'EUROPA', ASIA: 'ASIA', 'NORTH AMERICA': 'AMÉRICA DEL NORTE', 'SOUTH AMERICA': 'AMÉRICA DEL SUR', AUSTRALIA: 'AUSTRALIA', ANTARCTICA: 'ANTÁRTIDA',
    'Pacific Ocean': 'Océano Pacífico', 'Atlantic Ocean': 'Océano Atlántico', 'Indian Ocean': 'Océano Índico',
  },
  credits: { basemap: 'Mapa base: Natural Earth vía world-atlas (dominio público)', places: 'Lugares: GeoNames (CC BY 4.0)' },
  deltaTModel: {
    builtIn: (first, last, forecastTo) => `observado ${first}–${last}, previsión hasta ${forecastTo}, Espenak–Meeus después`,
    fixed: (seconds) => `fijo, ${seconds} s (indicado por el usuario)`,
  },
  deltaTSources: { observed: 'observado', forecast: 'previsión', historical: 'histórico', 'long-term': 'a largo plazo', user: 'indicado por el usuario' },
  clock: {
    locale: 'es',
    julianBeside: (julianDate) => ` (juliano: ${julianDate})`,
    dayMark: (days) => ` ${days > 0 ? '+' : '−'}${Math.abs(days)} ${Math.abs(days) === 1 ? 'día' : 'días'}`,
    until: (label, lastTime) => `${label} hasta las ${lastTime}`,
    then: ', después ',
  },
};
