/**
 * Los eclipses de Sol en español: la advertencia de seguridad ocular, con
 * todo el contenido de la inglesa (caution.ts): filtros ISO 12312-2 o
 * proyección; nunca una fase parcial o anular sin protección; la totalidad,
 * solo dentro de la franja; instrumentos con filtro frontal; niños
 * acompañados; las autoridades sanitarias locales. Y el resto de sus
 * palabras: el horario local, el pie de foto y el texto alternativo, la hoja
 * de contactos. Reviewed wording, in the terms of the lunar Spanish
 * catalogue (words/lunar/es.ts); the trade's contact names (C1…C4), ΔT,
 * saros and the Besselian elements stay as astronomers write them.
 */
import { COMMON_SPANISH } from '../common/es.ts';
import { decimalIn, listWords } from '../common.ts';
import type { SolarWords } from './caution.ts';
import type { SolarKindWord, SolarTextWords } from './text.ts';

const plural = new Intl.PluralRules('es');
const whole = new Intl.NumberFormat('es', { maximumFractionDigits: 0 });
/** A magnitude handed over as "0.957", written with the Spanish decimal comma. */
const decimal = (text: string) => decimalIn(text, COMMON_SPANISH);
const list = (items: readonly string[]) => listWords(items, COMMON_SPANISH);

/** "total", "anular"… inside a sentence: "el eclipse total de Sol". */
const KIND: Record<SolarKindWord, string> = { total: 'total', annular: 'anular', hybrid: 'híbrido', partial: 'parcial' };
/** The central path by the eclipse's kind: every one a "franja", so the article agrees (la). */
const PATH: Record<'total' | 'annular' | 'hybrid', string> = {
  total: 'franja de totalidad',
  annular: 'franja del eclipse anular',
  hybrid: 'franja central (total en unos tramos, anular en otros)',
};
/** The central phase by the eclipse's kind, with its article. */
const CENTRAL: Record<'total' | 'annular' | 'hybrid', string> = { total: 'la totalidad', annular: 'la fase anular', hybrid: 'la fase central' };

export const SOLAR_TEXT_SPANISH: SolarTextWords = {
  common: COMMON_SPANISH,
  events: {
    C1: 'la Luna empieza a cubrir el Sol',
    C2: 'empieza la fase central',
    maximum: 'máximo del eclipse',
    C3: 'termina la fase central',
    C4: 'la Luna deja de cubrir el Sol',
    sunrise: 'salida del Sol',
    sunset: 'puesta del Sol',
  },
  central: { total: 'totalidad', annular: 'fase anular' },
  caption: {
    title: (kind, date) => `Eclipse ${KIND[kind]} de Sol${kind === 'hybrid' ? ' (total y anular)' : ''} del ${date}.`,
    greatest: (stamp, where, alt) =>
      `Máximo del eclipse a las ${stamp} cerca de ${where}, ${Math.round(alt) <= 0 ? 'con el Sol en el horizonte' : `con el Sol a ${Math.round(alt)}° de altura`}.`,
    centralFacts: (kind, duration, width) => {
      const what = kind === 'annular' ? 'el anillo de luz dura' : `${CENTRAL[kind]} dura`;
      const parts = [duration ? `${what} ${duration}` : undefined, width !== undefined ? `la franja mide ${whole.format(Math.round(width))} km de ancho` : undefined]
        .filter((p) => p !== undefined);
      return parts.length > 0 ? `En ese punto, ${list(parts)}.` : '';
    },
    nonCentral: (kind) => `El eje de la sombra no llega a cortar la Tierra: la ${kind === 'total' ? 'umbra' : 'antumbra'} solo la roza cerca de un polo.`,
    partialOnly: (magnitude) => `Solo la penumbra de la Luna alcanza la Tierra: el eclipse es parcial en todas partes, con una magnitud máxima de ${decimal(magnitude)}.`,
    pathCrosses: (kind, countries, more) =>
      `La ${PATH[kind]} atraviesa ${list(more > 0 ? [...countries, plural.select(more) === 'one' ? 'otro país' : `otros ${more} países`] : countries)}.`,
    pathOverSea: (kind) => `La ${PATH[kind]} solo cruza mar abierto, sin tocar tierra de ningún país.`,
    continent: (name, share) => (share === 'whole' ? name : share === 'most' ? `la mayor parte de ${name}` : `partes de ${name}`),
    partialSeen: (where) => `El eclipse parcial se ve desde ${where}.`,
    citiesIntro: 'Entre las grandes ciudades:',
    cityCentral: (city, kind, duration, from) => `en ${city}, ${kind === 'total' ? 'la totalidad' : 'la fase anular'} dura ${duration} a partir de las ${from}`,
    cityPartial: (city, percent, at, when) => {
      // A share that rounds to "0 %" is still a bite out of the Sun: "menos del 1 %", without the article.
      const share = /^0\s?%$/.test(percent) ? 'menos del 1 %' : `el ${percent}`;
      return when === 'maximum' ? `en ${city}, la Luna cubre ${share} del Sol a las ${at}`
        : `en ${city}, el Sol ${when === 'sunrise' ? 'sale' : 'se pone'} con ${share} de su disco cubierto, a las ${at}`;
    },
    altText: (kind, date, path, partial) => [`Mapa del eclipse ${KIND[kind]} de Sol del ${date}.`, path, partial].filter((p) => p).join(' '),
    file: (caption, alt) => `${caption}\n\nTexto alternativo: ${alt}\n`,
  },
  sheet: {
    title: (lunarToo, from, last) => `Eclipses ${lunarToo ? 'de Luna y de Sol' : 'de Sol'} del ${from} al ${last}`,
    kind: { total: 'total de Sol', annular: 'anular de Sol', hybrid: 'híbrido de Sol', partial: 'parcial de Sol' },
    magnitude: (value) => `magnitud ${decimal(value)}`,
    central: (kind, duration) => `${kind === 'total' ? 'totalidad' : kind === 'annular' ? 'fase anular' : 'fase central'} de ${duration} en el máximo`,
    width: (km) => `franja de ${km} km de ancho`,
    saros: (n) => `saros ${n}`,
    noMap: 'Pie de foto y geometría GeoJSON; aún sin imagen del mapa.',
  },
};

export const SOLAR_SPANISH: SolarWords = {
  body: 'solar',
  common: COMMON_SPANISH,
  caution: {
    long: {
      viewers: 'Mire el Sol solo a través de gafas de eclipse o visores de mano que cumplan la norma ISO 12312-2, o contemple su imagen proyectada sobre una cartulina.',
      neverUnprotected: 'No mire nunca una fase parcial o anular sin protección, por mucho que esté cubierto el Sol: hasta un fino filo de Sol puede dañar la vista.',
      totality: 'Solo dentro de la franja de totalidad, y solo mientras la Luna oculta el Sol por completo, pueden quitarse los visores; vuelva a ponérselos en cuanto reaparezca la primera luz brillante.',
      noTotality: 'Fuera de la franja de totalidad no es seguro en ningún momento mirar sin filtro.',
      optics: 'Los prismáticos, telescopios y cámaras necesitan un filtro solar adecuado colocado delante del instrumento; no mire nunca a través de ellos solo con gafas de eclipse.',
      children: 'Los niños deben observar siempre acompañados de un adulto.',
      authorities: 'Siga las recomendaciones de las autoridades sanitarias locales.',
    },
    short: {
      viewers: 'Seguridad ocular: observe solo con visores de eclipse ISO 12312-2 o por proyección; no mire nunca una fase parcial o anular sin protección, por mucho que esté cubierto el Sol.',
      totality: 'Quítese los visores solo mientras la totalidad oculta el Sol por completo, y vuelva a ponérselos con la primera luz brillante.',
      noTotality: 'Fuera de la franja de totalidad no es seguro en ningún momento mirar sin filtro.',
      both: 'Dentro de la franja, visores fuera solo mientras la totalidad oculta el Sol por completo, y de nuevo puestos con la primera luz brillante; fuera de ella, no es seguro en ningún momento mirar sin filtro.',
      rest: 'Nada de prismáticos, telescopios ni cámaras sin filtro solar frontal. Niños siempre acompañados; siga las indicaciones sanitarias locales.',
    },
  },
};
