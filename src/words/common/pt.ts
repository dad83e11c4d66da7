/**
 * Palavras comuns em português: o Intl escreve números, durações e datas;
 * aqui fica o resto. Country names from i18n-iso-countries except where prose
 * uses a shorter form (and where the package swaps the two Congos).
 */
import type { CommonWords } from '../common.ts';

export const COMMON_PORTUGUESE: CommonWords = {
  locale: 'pt',
  numerals: { digits: 'ascii', decimalSign: ',' },
  predictions: 'São previsões: o que se verá depende do tempo e do horizonte local.',
  durationUnits: {
    long: { hour: ' h', minute: ' min' },
    compact: { hour: 'h', minute: 'min' },
  },
  and: 'e',
  punctuation: { colon: ': ', semicolon: '; ' },
  hemispheres: { north: 'N', south: 'S', east: 'E', west: 'O' },
  countryNames: {
    CD: 'República Democrática do Congo',
    CG: 'República do Congo',
    PS: 'Palestina',
    MM: 'Mianmar',
  },
  continents: {
    Africa: 'África', Antarctica: 'Antártida', Asia: 'Ásia', Europe: 'Europa', 'North America': 'América do Norte', Oceania: 'Oceania', 'South America': 'América do Sul',
  },
  mapAreas: {
    AFRICA: 'ÁFRICA', EUROPE: 'EUROPA', ASIA: 'ÁSIA', 'NORTH AMERICA': 'AMÉRICA DO NORTE', 'SOUTH AMERICA': 'AMÉRICA DO SUL', AUSTRALIA: 'AUSTRÁLIA', ANTARCTICA: 'ANTÁRTIDA',
    'Pacific Ocean': 'Oceano Pacífico', 'Atlantic Ocean': 'Oceano Atlântico', 'Indian Ocean': 'Oceano Índico',
  },
  credits: { basemap: 'Mapa de base: Natural Earth via world-atlas (domínio público)', places: 'Locais: GeoNames (CC BY 4.0)' },
  deltaTModel: {
    builtIn: (first, last, forecastTo) => `observado ${first}–${last}, previsão até ${forecastTo}, Espenak–Meeus depois`,
    fixed: (seconds) => `fixo, ${seconds} s (indicado pelo utilizador)`,
  },
  deltaTSources: { observed: 'observado', forecast: 'previsão', historical: 'histórico', 'long-term': 'longo prazo', user: 'indicado pelo utilizador' },
  clock: {
    locale: 'pt',
    julianBeside: (julianDate) => ` (juliano: ${julianDate})`,
    dayMark: (days) => ` ${days > 0 ? '+' : '−'}${Math.abs(days)} ${Math.abs(days) === 1 ? 'dia' : 'dias'}`,
    until: (label, lastTime) => `${label} até ${lastTime}`,
    then: ', depois ',
  },
};
