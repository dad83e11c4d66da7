/**
 * Le eclissi di Sole in italiano: l’avvertenza per la sicurezza degli occhi,
 * con tutto il contenuto di quella inglese (filtri ISO 12312-2 o proiezione;
 * mai una fase parziale o anulare senza protezione; la totalità, solo nella
 * fascia; strumenti con filtro anteriore; bambini accompagnati; le autorità
 * sanitarie locali), le parole della mappa, dello schema, delle didascalie,
 * della tabella locale, del riassunto e del calendario. Reviewed wording,
 * consistent with the lunar catalogue (lunar/it.ts): the trade's contact
 * names (C1…C4), ΔT and saros stay as astronomers write them; "fascia di
 * totalità" as in the caution.
 */
import { COMMON_ITALIAN } from '../common/it.ts';
import { decimalIn, listWords } from '../common.ts';
import type { SolarWords } from './caution.ts';
import type { SolarDiagramWords } from './diagram.ts';
import type { SolarFigureWords } from './figures.ts';
import type { SolarKindWord, SolarTextWords } from './text.ts';

const list = (items: readonly string[]) => listWords(items, COMMON_ITALIAN);
const number = (text: string) => decimalIn(text, COMMON_ITALIAN);

/** "del 12 agosto 2026", "dell’8 aprile 2024", "dell’11 luglio 1991": the article elides before a number read with a vowel (otto, undici). */
const ofDate = (date: string) => (/^(8|11)\s/.test(date) ? `dell’${date}` : `del ${date}`);
/** A number read aloud with a vowel first (uno, otto, undici, ottanta…), before which the article elides. */
const readWithVowel = (number: string) => /^(1|8|11|8\d)(\D|$)/.test(number);
/** "il 63 %", "l’80 %", "l’8,5 %", "l’1 %": the article before a percentage. */
const thePercent = (percent: string) => (readWithVowel(percent) ? `l’${percent}` : `il ${percent}`);
/** "del 63,4 %", "dell’80,2 %". */
const ofThePercent = (percent: string) => (readWithVowel(percent) ? `dell’${percent}` : `del ${percent}`);
/** "al 63 %", "all’80 %". */
const atThePercent = (percent: string) => (readWithVowel(percent) ? `all’${percent}` : `al ${percent}`);
/** "il 13 agosto 2026", "l’8 agosto 2026": a date as the object of a sentence. */
const theDate = (date: string) => (/^(8|11)\s/.test(date) ? `l’${date}` : `il ${date}`);

/** The Sun's altitude below the horizon, said as a depth: "con il Sole 4° sotto l’orizzonte". */
const belowHorizon = (altitude: string) => {
  const depth = altitude.replace(/^[-−]/, '');
  return /^0(\D|$)/.test(depth) ? 'con il Sole sull’orizzonte' : `con il Sole ${depth}° sotto l’orizzonte`;
};

/** "da Oviedo", but "dal punto di massimo": the figure's own name for a place carries its article, which joins the preposition. */
const fromPlace = (place: string) => (place.startsWith('il ') ? `dal ${place.slice(3)}` : `da ${place}`);
/** A position written "65.22°N 25.28°W" put in this language's decimal sign and hemisphere letters: "65,22°N, 25,28°O". */
const position = (text: string) => text.replace(/(\d+(?:\.\d+)?)°([NS]),? (\d+(?:\.\d+)?)°([EW])/, (_all, lat: string, ns: string, lon: string, ew: string) =>
  `${number(lat)}°${ns === 'N' ? COMMON_ITALIAN.hemispheres.north : COMMON_ITALIAN.hemispheres.south}, ${number(lon)}°${ew === 'E' ? COMMON_ITALIAN.hemispheres.east : COMMON_ITALIAN.hemispheres.west}`);

/** "eclissi totale di Sole"; the hybrid kind says what it is in brackets, after the noun. */
const KIND: Record<SolarKindWord, string> = { total: 'totale', annular: 'anulare', hybrid: 'ibrida', partial: 'parziale' };
const eclipseOfTheSun = (kind: SolarKindWord) => `eclissi ${KIND[kind]} di Sole${kind === 'hybrid' ? ' (totale e anulare)' : ''}`;
/** The band on the ground, every name feminine (la fascia). */
const PATH_NAME = {
  total: 'fascia di totalità',
  annular: 'fascia di anularità',
  hybrid: 'fascia centrale (totale in alcuni tratti, anulare in altri)',
} as const;

const FIGURES: SolarFigureWords = {
  common: COMMON_ITALIAN,
  kindTitle: { total: 'Eclissi totale di Sole', annular: 'Eclissi anulare di Sole', hybrid: 'Eclissi ibrida di Sole', partial: 'Eclissi parziale di Sole' },
  kindInSentence: { total: 'eclissi totale di Sole', annular: 'eclissi anulare di Sole', hybrid: 'eclissi ibrida di Sole', partial: 'eclissi parziale di Sole' },
  centralPhase: { total: 'totalità', annular: 'anularità', hybrid: 'fase centrale' },
  minutesSeconds: { minutes: (minutes, seconds) => `${minutes} min ${seconds} s`, seconds: (seconds) => `${seconds} s` },
  percentText: { percent: (value) => `${value} %`, underOne: 'meno dell’1 %' },
  map: {
    title: (kindTitle, date) => `${kindTitle} · ${date}`,
    greatest: (stamp, coordinates) => `Massimo ${stamp} a ${coordinates}`,
    magnitude: (value) => `magnitudine ${value}`,
    centralOnLine: (phase, duration) => `${phase} di ${duration} sulla linea centrale`,
    pathWidth: (km) => `fascia larga ${km} km`,
    separator: ' · ',
    timesIn: (zone) => `Orari in ${zone}, 24 ore; «+1 giorno»: il giorno dopo la data del titolo.`,
    shading: 'Ombreggiatura: la massima parte del disco solare nascosta con il Sole sopra l’orizzonte (bordo superiore sopra un orizzonte al livello del mare, con rifrazione standard).',
    moonRadii: (k1, k2) => `raggio lunare k1 = ${k1} (fasi parziali), k2 = ${k2} (fascia)`,
    elements: (deltaT, source, moonRadii) =>
      `Elementi besseliani calcolati con astronomy-engine; ΔT ${deltaT} s (${source}); ${moonRadii}; bordo lunare supposto liscio: i limiti della fascia possono spostarsi di un chilometro o più.`,
    credits: (basemap, font, generator) => `${basemap}. Carattere: ${font}. Realizzato con ${generator}.`,
  },
  legend: {
    ramp: ['meno del 20 % del Sole nascosto', '20–40 %', '40–60 %', '60–80 %', 'oltre l’80 % (Sole visibile)'],
    path: { total: 'Fascia di totalità', annular: 'Fascia di anularità', hybrid: 'Fascia (totale o anulare)' },
    centralLine: (clock) => `Linea centrale, orari in ${clock}`,
    pathLimits: 'Limiti della fascia',
    partialLimits: 'Limiti dell’eclissi parziale',
    riseSet: 'Eclissi in corso all’alba o al tramonto',
    greatest: 'Massimo dell’eclissi',
    contours: 'Stessa parte del Sole nascosta',
    town: 'Località segnata',
  },
  riseSet: (contact, sun) => `${contact === 'C1' ? 'inizia' : 'finisce'} ${sun === 'sunrise' ? 'all’alba' : 'al tramonto'}`,
  mark: {
    notSeen: (name) => `${name} · non visibile`,
    central: (name, kind, time, duration) => `${name} · ${kind === 'total' ? 'totale' : 'anulare'} ${time}${duration !== undefined ? `, ${duration}` : ''}`,
    partial: (name, percent, time, at) => `${name} · ${percent} ${at === undefined ? 'alle' : at === 'sunrise' ? 'all’alba,' : 'al tramonto,'} ${time}`,
  },
  caption: {
    path: (kind) => ` La banda scura è la ${PATH_NAME[kind]}, con la linea centrale e gli orari.`,
    facts: (kind, date, subtitle) => `${kind.replace(/^e/, 'E')} ${ofDate(date)}. ${subtitle}.`,
    shading: (path) => `L’ombreggiatura indica quanta parte del Sole resta nascosta al massimo, con il Sole sopra l’orizzonte.${path}`,
    altText: (kind, date, path) => `Mappa dell’${kind} ${ofDate(date)}: l’ombreggiatura, più scura dove il Sole è più nascosto, indica dove si vede l’eclissi parziale.${path}`,
    file: (caption, altText) => `${caption}\n\nTesto alternativo: ${altText}\n`,
  },
};

/**
 * Didascalie, eventi locali e foglio provini delle eclissi di Sole. Country
 * names are listed after a colon, never after a verb: Italian gives most of
 * them an article ("l’Islanda", "gli Stati Uniti"), which the list of names
 * cannot know.
 */
export const SOLAR_TEXT_ITALIAN: SolarTextWords = {
  common: COMMON_ITALIAN,
  events: {
    C1: 'la Luna inizia a coprire il Sole',
    C2: 'inizia la fase centrale',
    maximum: 'massimo dell’eclissi',
    C3: 'finisce la fase centrale',
    C4: 'la Luna lascia il disco del Sole',
    sunrise: 'sorgere del Sole',
    sunset: 'tramonto del Sole',
  },
  central: { total: 'totalità', annular: 'anularità' },
  caption: {
    title: (kind, date) => `${eclipseOfTheSun(kind).replace(/^e/, 'E')} ${ofDate(date)}.`,
    greatest: (stamp, where, alt) =>
      `Massimo dell’eclissi alle ${stamp} nei pressi di ${where}, ${Math.round(alt) <= 0 ? 'con il Sole sull’orizzonte' : `con il Sole alto ${Math.round(alt)}°`}.`,
    centralFacts: (kind, duration, width) => {
      const what = kind === 'annular' ? 'l’anello di luce solare dura' : kind === 'total' ? 'la totalità dura' : 'la fase centrale dura';
      const parts = [duration ? `${what} ${duration}` : undefined, width !== undefined ? `la fascia è larga ${Math.round(width)} km` : undefined].filter((p) => p !== undefined);
      return parts.length > 0 ? `In quel punto ${list(parts)}.` : '';
    },
    nonCentral: (kind) => `L’asse del cono d’ombra non incontra la Terra: ${kind === 'total' ? 'l’ombra' : 'l’antiombra'} la sfiora soltanto vicino a un polo.`,
    partialOnly: (magnitude) => `Solo la penombra della Luna raggiunge la Terra: l’eclissi è parziale ovunque, con magnitudine massima ${number(magnitude)}.`,
    pathCrosses: (kind, countries, more) => {
      const names = more > 0 ? [...countries, more === 1 ? 'un altro' : `altri ${more}`] : countries;
      return `${countries.length + more === 1 ? 'Paese attraversato' : 'Paesi attraversati'} dalla ${PATH_NAME[kind]}: ${list(names)}.`;
    },
    pathOverSea: (kind) => `La ${PATH_NAME[kind]} passa solo sul mare aperto, senza toccare la terraferma di alcun paese.`,
    // Every continent's name starts with a vowel: "tutta l’Europa", "gran parte dell’Asia".
    // A continent's English name (countries-list's) is put into Italian here; a name already translated passes as it is.
    continent: (english, share) => {
      const name = (COMMON_ITALIAN.continents as Readonly<Record<string, string>>)[english] ?? english;
      return share === 'whole' ? `tutta l’${name}` : share === 'most' ? `gran parte dell’${name}` : `parte dell’${name}`;
    },
    partialSeen: (where) => `L’eclissi parziale è visibile in ${where}.`,
    citiesIntro: 'Tra le città più grandi:',
    cityCentral: (city, kind, duration, from) => `${city} vede ${kind === 'total' ? 'la totalità' : 'l’anello'} per ${duration} dalle ${from}`,
    cityPartial: (city, percent, at, when) =>
      when === 'maximum' ? `${city} vede la Luna coprire ${/^0(\D|$)/.test(percent) ? 'meno dell’1 %' : thePercent(percent)} del Sole alle ${at}`
        : `${city} vede ${when === 'sunrise' ? 'sorgere' : 'tramontare'} il Sole coperto ${/^0(\D|$)/.test(percent) ? 'per meno dell’1 %' : atThePercent(percent)}, alle ${at}`,
    altText: (kind, date, path, partial) => [`Mappa dell’${eclipseOfTheSun(kind)} ${ofDate(date)}.`, path, partial].filter((p) => p).join(' '),
    file: (caption, alt) => `${caption}\n\nTesto alternativo: ${alt}\n`,
  },
  sheet: {
    title: (lunarToo, from, last) => `Eclissi ${lunarToo ? 'di Luna e di Sole' : 'di Sole'} dal ${from} al ${last}`,
    kind: { total: 'totale di Sole', annular: 'anulare di Sole', hybrid: 'ibrida di Sole', partial: 'parziale di Sole' },
    magnitude: (value) => `magnitudine ${number(value)}`,
    central: (kind, duration) => `${kind === 'total' ? 'totalità' : kind === 'annular' ? 'anularità' : 'fase centrale'} ${duration} al massimo`,
    width: (km) => `fascia larga ${km} km`,
    saros: (n) => `saros ${n}`,
    noMap: 'Didascalia e geometria GeoJSON; lo stile non chiede un’immagine della mappa.',
    // `kind` is one of `kind` above: "Mappa dell’eclissi totale di Sole del 12 agosto 2026".
    thumbnailAlt: (kind, date) => `Mappa dell’eclissi ${kind} ${ofDate(date)}`,
    lunarKind: (kind) => `${kind} di Luna`,
  },
  list: {
    header: ['Data', 'Astro', 'Tipo', 'Massimo (UTC)', 'Magnitudine', 'Mag. penombrale', 'Gamma', 'Nell’ombra', 'Totalità', 'Centrale', 'Fascia', 'Saros'],
    body: { lunar: 'Luna', solar: 'Sole' },
    kind: { total: 'totale', annular: 'anulare', hybrid: 'ibrida', partial: 'parziale' },
    // "eclissi" is the same in the singular and the plural.
    eclipses: (lunar, solar) => `${lunar} eclissi di Luna e ${solar} di Sole`,
    solarEclipses: (count) => `${count} eclissi di Sole`,
    magnitudeNote: 'Magnitudine: per la Luna, quella d’ombra; per il Sole, la frazione del suo diametro coperta, nel punto di massimo dell’eclissi.',
    solarNote: (k1, k2) =>
      `Sole: centrale = totalità o anularità sulla linea centrale, al massimo dell’eclissi; fascia = la sua larghezza in quel punto; raggio lunare k1 = ${k1} (penombra), k2 = ${k2} (ombra e antiombra).`,
    central: (minutes, seconds) => `${minutes}min ${seconds}s`,
    pathWidth: (km) => `${km} km`,
  },
  minutesSeconds: { minutes: (minutes, seconds) => `${minutes} min ${seconds} s`, seconds: (seconds) => `${seconds} s` },
  percent: (value) => `${value} %`,
  // Every central phase named here is feminine; the article elides before a vowel: "inizia l’anularità".
  centralEdge: { edge: (central, edge) => `${edge === 'begins' ? 'inizia' : 'finisce'} ${/^[aeiou]/.test(central) ? 'l’' : 'la '}${central}`, unseen: 'fase centrale (Sole sotto l’orizzonte)' },
  local: {
    eventLabel: { maximum: 'Massimo', sunrise: 'Alba', sunset: 'Tramonto' },
    header: (zone) => ['Evento', 'Che cosa accade', `Locale (${zone})`, 'UTC', 'Alt. Sole', 'Az. Sole', 'Sole visibile'],
    yes: 'sì',
    no: 'no',
    title: (kind, id, place, coordinates, zone) => `Eclissi ${KIND[kind]} di Sole ${id} vista da ${place} (${coordinates}; ${zone})`,
    seen: {
      total: (m) => `Da qui si vede un’eclissi totale (magnitudine ${number(m)}).`,
      annular: (m, o) => `Da qui si vede un’eclissi anulare (magnitudine ${number(m)}; è coperto ${thePercent(o)} del disco solare).`,
      partial: (m, o) => `Da qui si vede un’eclissi parziale (magnitudine ${number(m)}; al massimo è coperto ${thePercent(o)} del disco solare).`,
      partialLow: (o) => `Da qui si vede un’eclissi parziale: finché il Sole è sopra l’orizzonte è coperto al più ${thePercent(o)} del disco solare (il massimo avviene con il Sole sotto l’orizzonte).`,
      none: 'Da qui l’eclissi non è visibile.',
    },
    timeNote: (zone) =>
      `Ora locale: ${zone}. Orari al secondo. Altezza del Sole: quella del centro, con rifrazione (Saemundsson) da −1° veri in su, geometrica sotto; «visibile»: bordo superiore sopra un orizzonte al livello del mare.`,
    modelNote: (k1, k2, deltaT, source, predictions) =>
      `Raggio lunare k1 = ${k1} (penombra: C1, C4, magnitudine), k2 = ${k2} (ombra e antiombra: C2, C3); bordo lunare supposto liscio, osservatore al livello del mare; ΔT ${deltaT} s (${source}). ${predictions}`,
    safetyHeading: { plain: 'SICUREZZA DEGLI OCCHI', markdown: 'Sicurezza degli occhi' },
  },
  summary: {
    missed: (place, id) => `Da ${place} l’ombra della Luna passa lontano: il ${id} non si vede alcuna eclissi di Sole.`,
    sunDown: (place, span) => `Da ${place} il Sole è sotto l’orizzonte per tutta l’eclissi (${span}): non si vede nulla.`,
    central: (place, kind, duration, from, to) =>
      `Da ${place} ${kind === 'total' ? 'il Sole è totalmente eclissato' : 'la Luna sta tutta dentro il disco del Sole, lasciandone visibile un anello luminoso,'} per ${duration}, dalle ${from} alle ${to}.`,
    partial: (place, percent) => `Da ${place} il Sole è eclissato in parte: al massimo la Luna copre ${thePercent(percent)} del suo disco.`,
    runs: (span, localDate, stamp, altitude, up) =>
      `Orario dell’eclissi: ${span}${localDate === undefined ? '' : `, ${theDate(localDate)}`}; massimo alle ${stamp}, ${up ? `con il Sole alto ${altitude}°` : belowHorizon(altitude)}.`,
    risesEclipsed: (stamp) => `Il Sole sorge già eclissato, alle ${stamp}.`,
    setsEclipsed: (stamp) => `Il Sole tramonta ancora eclissato, alle ${stamp}.`,
    nearEdge: (km) =>
      `Questo luogo si trova a meno di ${km} km dal limite della fascia: le irregolarità del bordo lunare e l’incertezza su ΔT possono spostare il limite di un chilometro o più, quindi la fase centrale potrebbe durare meno o non vedersi affatto.`,
    lowSun: (degrees) => `Il Sole non supera i ${degrees}° di altezza: serve un orizzonte basso e sgombro in quella direzione.`,
  },
  calendar: {
    partialTitle: 'Fasi parziali dell’eclissi di Sole',
    centralTitle: { total: 'Totalità', annular: 'Anularità' },
    cutShort: ' (Sole visibile)',
    cutLong: ' (la parte con il Sole sopra l’orizzonte)',
    // "Totalità dell’eclissi del 2026-08-12", "Fasi parziali dell’eclissi di Sole del 2026-08-12": the eclipse named once.
    description: (title, id, cut) => `${title}${/eclissi/.test(title) ? '' : ' dell’eclissi'} del ${id}${cut}; sono previsioni, tempo permettendo.`,
    notSeenTitle: (place) => `Eclissi di Sole, non visibile da ${place}`,
    notSeenDescription: 'Questa voce segna solo la data: da qui non c’è nulla da vedere.',
  },
};

/** Lo schema del Sole e della Luna visti da un luogo al massimo, e la sua didascalia. */
const DIAGRAM: SolarDiagramWords = {
  common: COMMON_ITALIAN,
  moments: {
    C1: 'la Luna tocca il Sole',
    C2: 'inizia la fase centrale',
    maximum: 'massima copertura del Sole',
    C3: 'finisce la fase centrale',
    C4: 'la Luna lascia il Sole',
    sunrise: 'sorgere del Sole',
    sunset: 'tramonto del Sole',
  },
  momentLabel: { maximum: 'Massimo', sunrise: 'Alba', sunset: 'Tramonto' },
  legend: {
    sun: 'il disco del Sole',
    moonOverSun: 'la Luna davanti al Sole',
    moonOutline: 'il contorno della Luna (invisibile in cielo)',
  },
  compass: { north: 'N', east: 'E' },
  sunAcross: (arcmin) => `diametro del Sole: ${arcmin}′`,
  timesHeading: (zone) => `Orari (${zone ?? 'ciascuno con il suo fuso'})`,
  sunAltitude: { up: (degrees) => `Sole a ${degrees}°`, down: 'Sole sotto l’orizzonte' },
  kind: { total: 'totale', annular: 'anulare', hybrid: 'ibrida', partial: 'parziale' },
  title: (date, kind, place) => `${date}: eclissi ${kind} di Sole vista ${fromPlace(place)}`,
  percent: (value) => `${value} %`,
  atMaximum: (stamp, sunAltitude, magnitude, obscuration) =>
    `Al massimo, alle ${stamp}${sunAltitude === undefined ? ' (con il Sole sotto l’orizzonte)' : `, con il Sole alto ${sunAltitude}°`}: magnitudine ${magnitude}, oscuramento ${ofThePercent(obscuration)} del disco solare.`,
  elsewhere: (kind) => `Altrove l’eclissi è ${kind}.`,
  smallPrint: {
    drawn: (place) => `Il Sole e la Luna visti ${fromPlace(place)} al massimo, in scala: nord in alto, verso il polo celeste della data; est a sinistra, come appare il cielo a chi lo guarda.`,
    terms: 'Magnitudine: la frazione del diametro del Sole coperta; oscuramento: la frazione del suo disco.',
    times: (zone, deltaT, source) => `Orari in ${zone}, 24 ore. ΔT ${deltaT} s (${source}).`,
    credits: (font, generator) => `Carattere: ${font}. Realizzato con ${generator}.`,
  },
  greatestPoint: (where) => `il punto di massimo (${position(where)})`,
  caption: {
    summary: (time, obscuration, place, magnitude) => `Alle ${time} la Luna copre ${thePercent(obscuration)} del disco solare visto ${fromPlace(place)} (magnitudine ${magnitude}).`,
    altText: (place, positionAngle) =>
      `Schema del disco del Sole con davanti il disco scuro della Luna, in scala, come appare ${fromPlace(place)} al massimo; il centro della Luna è all’angolo di posizione ${positionAngle}°, contato da nord verso est; nord in alto, est a sinistra, e accanto l’elenco degli orari dell’eclissi.`,
    file: (title, summary, caution, altText) => `${title}. ${summary}\n\n${caution}\n\nTesto alternativo: ${altText}\n`,
  },
};

export const SOLAR_ITALIAN: SolarWords = {
  body: 'solar',
  common: COMMON_ITALIAN,
  text: SOLAR_TEXT_ITALIAN,
  figures: FIGURES,
  diagram: DIAGRAM,
  caution: {
    long: {
      viewers: 'Guardate il Sole solo attraverso occhiali per eclissi o visori a mano conformi alla norma ISO 12312-2, oppure osservatene l’immagine proiettata su un cartoncino.',
      neverUnprotected: 'Non guardate mai una fase parziale o anulare senza protezione, per quanto il Sole sia coperto: anche una sottile falce può danneggiare l’occhio.',
      totality: 'Solo nella fascia di totalità, e solo mentre la Luna nasconde completamente il Sole, si possono togliere i visori; rimetteteli appena ricompare la prima luce intensa.',
      noTotality: 'Fuori dalla fascia di totalità non è mai sicuro guardare senza filtro.',
      optics: 'Binocoli, telescopi e fotocamere richiedono un filtro solare adatto montato davanti allo strumento; non guardate mai attraverso di essi con i soli occhiali per eclissi.',
      children: 'I bambini devono osservare solo accanto a un adulto.',
      authorities: 'Seguite le indicazioni delle autorità sanitarie locali.',
    },
    short: {
      viewers: 'Sicurezza degli occhi: osservate solo con visori per eclissi ISO 12312-2 o per proiezione; non guardate mai una fase parziale o anulare senza protezione, per quanto il Sole sia coperto.',
      totality: 'Visori tolti solo mentre la totalità nasconde completamente il Sole, di nuovo indossati alla prima luce intensa.',
      noTotality: 'Fuori dalla fascia di totalità non è mai sicuro guardare senza filtro.',
      both: 'Nella fascia, visori tolti solo mentre la totalità nasconde completamente il Sole, di nuovo indossati alla prima luce intensa; fuori da essa non è mai sicuro guardare senza filtro.',
      rest: 'Niente binocoli, telescopi o fotocamere senza filtro solare anteriore. Bambini sempre accompagnati; seguite le indicazioni sanitarie locali.',
    },
  },
};
