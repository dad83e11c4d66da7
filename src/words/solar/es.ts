/**
 * Los eclipses de Sol en español: la advertencia de seguridad ocular, con
 * todo el contenido de la inglesa (caution.ts): filtros ISO 12312-2 o
 * proyección; nunca una fase parcial o anular sin protección; la totalidad,
 * solo dentro de la franja; instrumentos con filtro frontal; niños
 * acompañados; las autoridades sanitarias locales. Y el resto de sus
 * palabras: el horario local, el resumen, el calendario, el pie de foto y el
 * texto alternativo, la hoja de contactos, el mapa y el diagrama del Sol y la
 * Luna en el máximo. Reviewed wording, in the terms of the lunar Spanish
 * catalogue (words/lunar/es.ts); the trade's contact names (C1…C4), ΔT,
 * saros, gamma and k1/k2 stay as astronomers write them.
 */
import { COMMON_SPANISH } from '../common/es.ts';
import { decimalIn, listWords, type ContinentName } from '../common.ts';
import type { SolarWords } from './caution.ts';
import type { SolarDiagramWords } from './diagram.ts';
import type { SolarFigureWords } from './figures.ts';
import type { SolarKindWord, SolarTextWords } from './text.ts';

const plural = new Intl.PluralRules('es');
const whole = new Intl.NumberFormat('es', { maximumFractionDigits: 0 });
/** A magnitude handed over as "0.957", written with the Spanish decimal comma (a no-op on "0,957"). */
const decimal = (text: string) => decimalIn(text, COMMON_SPANISH);
const list = (items: readonly string[]) => listWords(items, COMMON_SPANISH);
/** "1 eclipse", "3 eclipses" (CLDR plural categories through Intl.PluralRules). */
const counted = (count: number, one: string, other: string) => `${count} ${plural.select(count) === 'one' ? one : other}`;
/** "el 63 %" with its article; a share that rounds to "0 %" is still a bite out of the Sun: "menos del 1 %". */
const share = (percent: string) => (/^0\s?%$/.test(percent) ? 'menos del 1 %' : `el ${percent}`);

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

/** The calendar entry of the partial phases, which names the eclipse itself. */
const PARTIAL_PHASES = 'Fases parciales del eclipse de Sol';

const TEXT: SolarTextWords = {
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
      `Máximo del eclipse a las ${stamp} cerca de ${where}, ${Math.round(alt) <= 0 ? 'con el Sol en el horizonte' : `con el Sol a ${whole.format(Math.round(alt))}° de altura`}.`,
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
    continent: (given, part) => {
      // The continent as the shared words name it, should it arrive under its English name.
      const name = COMMON_SPANISH.continents[given as ContinentName] ?? given;
      return part === 'whole' ? name : part === 'most' ? `la mayor parte de ${name}` : `partes de ${name}`;
    },
    partialSeen: (where) => `El eclipse parcial se ve desde ${where}.`,
    citiesIntro: 'Entre las grandes ciudades:',
    cityCentral: (city, kind, duration, from) => `en ${city}, ${kind === 'total' ? 'la totalidad' : 'la fase anular'} dura ${duration} a partir de las ${from}`,
    cityPartial: (city, percent, at, when) =>
      when === 'maximum' ? `en ${city}, la Luna cubre ${share(percent)} del Sol a las ${at}`
        : `en ${city}, el Sol ${when === 'sunrise' ? 'sale' : 'se pone'} con ${share(percent)} de su disco cubierto, a las ${at}`,
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
    noMap: 'Pie de foto y geometría GeoJSON; el estilo no pide imagen del mapa.',
    thumbnailAlt: (kind, date) => `Mapa del eclipse ${kind} del ${date}`,
    lunarKind: (kind) => `${kind} de Luna`,
  },
  list: {
    header: ['Fecha', 'Astro', 'Tipo', 'Máximo (UTC)', 'Magnitud', 'Mag. penumbral', 'Gamma', 'En la umbra', 'Totalidad', 'Fase central', 'Franja', 'Saros'],
    body: { lunar: 'Luna', solar: 'Sol' },
    kind: { total: 'total', annular: 'anular', hybrid: 'híbrido', partial: 'parcial' },
    eclipses: (lunar, solar) => `${counted(lunar, 'eclipse', 'eclipses')} de Luna y ${solar} de Sol`,
    solarEclipses: (count) => `${counted(count, 'eclipse', 'eclipses')} de Sol`,
    magnitudeNote: 'Magnitud: la de la umbra, para la Luna; la fracción del diámetro del Sol cubierta en el punto del máximo, para el Sol.',
    solarNote: (k1, k2) =>
      `Sol: fase central = totalidad o fase anular en la línea central, en el máximo del eclipse; franja = su anchura en ese punto; radio de la Luna k1 = ${decimal(k1)} (penumbra), k2 = ${decimal(k2)} (umbra y antumbra).`,
    central: (minutes, seconds) => `${minutes}min ${seconds}s`,
    pathWidth: (km) => `${km} km`,
  },
  minutesSeconds: { minutes: (minutes, seconds) => `${minutes} min ${seconds} s`, seconds: (seconds) => `${seconds} s` },
  percent: (value) => `${value} %`,
  // Spanish puts the verb first: "empieza la totalidad"; every central phase named here is feminine.
  centralEdge: { edge: (central, edge) => `${edge === 'begins' ? 'empieza' : 'termina'} la ${central}`, unseen: 'fase central (con el Sol bajo el horizonte)' },
  local: {
    eventLabel: { maximum: 'Máximo', sunrise: 'Salida', sunset: 'Puesta' },
    header: (zone) => ['Momento', 'Qué ocurre', `Local (${zone})`, 'UTC', 'Alt. Sol', 'Az. Sol', 'Sol visible'],
    yes: 'sí',
    no: 'no',
    title: (kind, id, place, coordinates, zone) => `Eclipse ${KIND[kind]} de Sol ${id} desde ${place} (${coordinates}; ${zone})`,
    seen: {
      total: (m) => `Desde aquí: eclipse total (magnitud ${decimal(m)}).`,
      annular: (m, o) => `Desde aquí: eclipse anular (magnitud ${decimal(m)}; ${o} del disco solar cubierto).`,
      partial: (m, o) => `Desde aquí: eclipse parcial (magnitud ${decimal(m)}; ${o} del disco solar cubierto en el máximo).`,
      partialLow: (o) => `Desde aquí: eclipse parcial, con a lo sumo ${o} del disco solar cubierto mientras el Sol está sobre el horizonte (el máximo llega con el Sol ya bajo el horizonte).`,
      none: 'Desde aquí no se ve nada.',
    },
    timeNote: (zone) =>
      `Hora local: ${zone}. Horas al segundo. Altura del Sol: la de su centro, con refracción (Saemundsson) desde −1° reales hacia arriba, geométrica por debajo; «visible»: el borde superior sobre un horizonte al nivel del mar.`,
    modelNote: (k1, k2, deltaT, source, predictions) =>
      `Radio de la Luna k1 = ${decimal(k1)} (penumbra: C1, C4, magnitud), k2 = ${decimal(k2)} (umbra y antumbra: C2, C3); limbo lunar liso, observador al nivel del mar; ΔT ${decimal(deltaT)} s (${source}). ${predictions}`,
    safetyHeading: { plain: 'SEGURIDAD OCULAR', markdown: 'Seguridad ocular' },
  },
  summary: {
    missed: (place, id) => `Desde ${place}, la sombra de la Luna pasa de largo: el ${id} no se ve ningún eclipse de Sol.`,
    sunDown: (place, span) => `Desde ${place}, el Sol está bajo el horizonte durante todo el eclipse (${span}): no se ve nada.`,
    central: (place, kind, duration, from, to) =>
      `Desde ${place}, ${kind === 'total' ? 'el Sol queda totalmente eclipsado' : 'la Luna se ve entera dentro del disco solar, rodeada de un anillo brillante,'} durante ${duration}, de las ${from} a las ${to}.`,
    partial: (place, percent) => `Desde ${place}, el Sol se eclipsa en parte: como máximo, queda cubierto ${share(percent)} de su disco.`,
    runs: (span, localDate, stamp, altitude, up) =>
      `Horario del eclipse: ${span}${localDate === undefined ? '' : ` (${localDate})`}; máximo a las ${stamp}, ${up ? `con el Sol a ${altitude}° de altura` : `con el Sol bajo el horizonte (${altitude}°)`}.`,
    risesEclipsed: (stamp) => `El Sol sale ya eclipsado, a las ${stamp}.`,
    setsEclipsed: (stamp) => `El Sol se pone aún eclipsado, a las ${stamp}.`,
    nearEdge: (km) =>
      `Este lugar está a menos de ${km} km del borde de la franja: las irregularidades del limbo lunar y la incertidumbre de ΔT pueden desplazar ese borde un kilómetro o más, así que la fase central puede ser más breve o no llegar a verse.`,
    lowSun: (degrees) => `El Sol no pasa de ${degrees}° de altura: hace falta un horizonte bajo y despejado en su dirección.`,
  },
  calendar: {
    partialTitle: PARTIAL_PHASES,
    centralTitle: { total: 'Totalidad', annular: 'Fase anular' },
    cutShort: ' (Sol visible)',
    cutLong: ' (la parte con el Sol sobre el horizonte)',
    // The partial phases' title names the eclipse already; the central phase's does not.
    description: (title, id, cut) => `${title}${title === PARTIAL_PHASES ? '' : ' del eclipse'} del ${id}${cut}; son predicciones, si el tiempo lo permite.`,
    notSeenTitle: (place) => `Eclipse de Sol, no visible desde ${place}`,
    notSeenDescription: 'Esta entrada solo señala la fecha: desde aquí no hay nada que ver.',
  },
};

/** The phrase for "at sunrise / sunset" as the map writes it, short: the lines and the marks are small. */
const AT_SUN = { sunrise: 'al salir el Sol', sunset: 'al ponerse el Sol' } as const;

const FIGURES: SolarFigureWords = {
  common: COMMON_SPANISH,
  kindTitle: { total: 'Eclipse total de Sol', annular: 'Eclipse anular de Sol', hybrid: 'Eclipse híbrido de Sol', partial: 'Eclipse parcial de Sol' },
  kindInSentence: { total: 'eclipse total de Sol', annular: 'eclipse anular de Sol', hybrid: 'eclipse híbrido de Sol', partial: 'eclipse parcial de Sol' },
  centralPhase: { total: 'totalidad', annular: 'fase anular', hybrid: 'fase central' },
  minutesSeconds: { minutes: (minutes, seconds) => `${minutes} min ${seconds} s`, seconds: (seconds) => `${seconds} s` },
  percentText: { percent: (value) => `${value} %`, underOne: 'menos del 1 %' },
  map: {
    title: (kindTitle, date) => `${kindTitle} · ${date}`,
    greatest: (stamp, coordinates) => `Máximo ${stamp} en ${coordinates}`,
    magnitude: (value) => `magnitud ${value}`,
    centralOnLine: (phase, duration) => `${phase} de ${duration} en la línea central`,
    pathWidth: (km) => `franja de ${km} km de ancho`,
    separator: ' · ',
    timesIn: (zone) => `Horas en ${zone}, reloj de 24 horas; «+1 día»: el día siguiente a la fecha del título.`,
    shading: 'Sombreado: la mayor fracción del disco solar oculta con el Sol sobre el horizonte (su borde superior sobre un horizonte al nivel del mar, con la refracción normal).',
    moonRadii: (k1, k2) => `radio de la Luna k1 = ${k1} (fases parciales), k2 = ${k2} (franja)`,
    elements: (deltaT, source, moonRadii) =>
      `Elementos besselianos de astronomy-engine; ΔT ${deltaT} s (${source}); ${moonRadii}; limbo lunar liso: los bordes de la franja pueden desplazarse un kilómetro o más.`,
    credits: (basemap, font, generator) => `${basemap}. Tipografía: ${font}. Hecho con ${generator}.`,
  },
  legend: {
    ramp: ['Sol oculto: menos del 20 %', '20–40 %', '40–60 %', '60–80 %', 'más del 80 % (Sol visible)'],
    path: { total: 'Franja de totalidad', annular: 'Franja de la fase anular', hybrid: 'Franja (total o anular)' },
    centralLine: (clock) => `Línea central, horas en ${clock}`,
    pathLimits: 'Límites de la franja',
    partialLimits: 'Límites del eclipse parcial',
    riseSet: 'Eclipse en curso al salir o ponerse el Sol',
    greatest: 'Máximo del eclipse',
    contours: 'Líneas de igual oscurecimiento',
    town: 'Localidad marcada',
  },
  riseSet: (contact, sun) => `${contact === 'C1' ? 'empieza' : 'termina'} ${AT_SUN[sun]}`,
  mark: {
    notSeen: (name) => `${name} · no visible`,
    central: (name, kind, time, duration) => `${name} · ${kind === 'total' ? 'total' : 'anular'} ${time}${duration !== undefined ? `, ${duration}` : ''}`,
    partial: (name, percent, time, at) => `${name} · ${percent} ${at ? `${AT_SUN[at]}, ` : 'a las '}${time}`,
  },
  caption: {
    path: (kind) =>
      ` La banda oscura es la ${kind === 'hybrid' ? 'franja del eclipse central (total en unos lugares, anular en otros)' : kind === 'total' ? 'franja de totalidad' : 'franja de la fase anular'}, con su línea central y sus horas.`,
    facts: (kind, date, subtitle) => `El ${kind} del ${date}. ${subtitle}.`,
    shading: (path) => `El sombreado indica qué parte del Sol queda oculta, como máximo, con el Sol sobre el horizonte.${path}`,
    altText: (kind, date, path) => `Mapa del ${kind} del ${date}: el sombreado, más oscuro cuanto más Sol queda oculto, marca dónde se ve el eclipse parcial.${path}`,
    file: (caption, altText) => `${caption}\n\nTexto alternativo: ${altText}\n`,
  },
};

const DIAGRAM: SolarDiagramWords = {
  common: COMMON_SPANISH,
  moments: {
    C1: 'la Luna toca el borde del Sol',
    C2: 'empieza la fase central',
    maximum: 'máxima ocultación del Sol',
    C3: 'termina la fase central',
    C4: 'la Luna deja el disco del Sol',
    sunrise: 'salida del Sol',
    sunset: 'puesta del Sol',
  },
  momentLabel: { maximum: 'Máximo', sunrise: 'Salida', sunset: 'Puesta' },
  legend: {
    sun: 'el disco del Sol',
    moonOverSun: 'la Luna delante del Sol',
    moonOutline: 'el contorno de la Luna (invisible contra el cielo)',
  },
  compass: { north: 'N', east: 'E' },
  sunAcross: (arcmin) => `el Sol mide ${arcmin}′ de diámetro`,
  timesHeading: (zone) => `Horas (${zone ?? 'cada una con su huso'})`,
  sunAltitude: { up: (degrees) => `Sol a ${degrees}°`, down: 'Sol bajo el horizonte' },
  kind: { total: 'total', annular: 'anular', hybrid: 'híbrido', partial: 'parcial' },
  // "en", not "desde": the title must fit a square page whole, and Spanish dates are long.
  title: (date, kind, place) => `${date}: eclipse ${kind} de Sol en ${place}`,
  percent: (value) => `${value} %`,
  atMaximum: (stamp, sunAltitude, magnitude, obscuration) =>
    `En el máximo, ${stamp}${sunAltitude === undefined ? ' (con el Sol entonces bajo el horizonte)' : `, con el Sol a ${sunAltitude}° de altura`}: magnitud ${magnitude}, oscurecimiento del ${obscuration} del disco solar.`,
  elsewhere: (kind) => `En otros lugares, el eclipse es ${kind}.`,
  smallPrint: {
    drawn: (place) =>
      `El Sol y la Luna vistos desde ${place} en el máximo, a escala: el norte arriba, hacia el polo celeste de la fecha; el este a la izquierda, como se ve el cielo al mirarlo de frente.`,
    terms: 'Magnitud: fracción del diámetro del Sol cubierta; oscurecimiento: fracción de la superficie de su disco.',
    times: (zone, deltaT, source) => `Horas en ${zone}, reloj de 24 horas. ΔT ${deltaT} s (${source}).`,
    credits: (font, generator) => `Tipografía: ${font}. Hecho con ${generator}.`,
  },
  greatestPoint: (position) => `el punto del máximo (${position})`,
  caption: {
    summary: (time, obscuration, place, magnitude) => `A las ${time}, la Luna cubre el ${obscuration} del disco solar visto desde ${place} (magnitud ${magnitude}).`,
    altText: (place, positionAngle) =>
      `Diagrama del disco del Sol con el disco oscuro de la Luna delante, a escala, tal como se ve desde ${place} en el máximo; el centro de la Luna está en el ángulo de posición ${positionAngle}°, contado desde el norte hacia el este. El norte queda arriba y el este a la izquierda; al lado figuran las horas del eclipse.`,
    file: (title, summary, caution, altText) => `${title}. ${summary}\n\n${caution}\n\nTexto alternativo: ${altText}\n`,
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
  text: TEXT,
  figures: FIGURES,
  diagram: DIAGRAM,
};
