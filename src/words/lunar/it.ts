/**
 * Le eclissi di Luna in italiano: la tabella, l’orario locale, il calendario,
 * il riassunto, la didascalia e il testo alternativo, il foglio provini e le
 * parole delle figure. Reviewed wording; the trade's contact names (P1…U4),
 * Danjon, Chauvenet, ΔT and saros stay as astronomers write them.
 */
import { COMMON_ITALIAN } from '../common/it.ts';
import { meantOnlyFor } from '../common.ts';
import type { LunarDiagramWords } from './diagram.ts';
import type { LunarFigureWords } from './figures.ts';
import type { LunarWords } from './text.ts';

const plural = new Intl.PluralRules('it');
const counted = (count: number, one: string, other: string) => `${count} ${plural.select(count) === 'one' ? one : other}`;
/** "del 3 marzo 2026", "dell’8 novembre 2022": the article elides before otto and undici. */
const ofDate = (date: string) => (/^(8|11)\s/.test(date) ? `dell’${date}` : `del ${date}`);

const FIGURES: LunarFigureWords = {
  common: COMMON_ITALIAN,
  nakedEye: meantOnlyFor('lunar', 'Un’eclissi di Luna si può osservare senza rischi a occhio nudo.'),
  kindTitle: { total: 'Eclissi totale di Luna', partial: 'Eclissi parziale di Luna', penumbral: 'Eclissi penombrale di Luna' },
  map: {
    title: (kindTitle, date) => `${kindTitle} · ${date}`,
    greatest: (stamp) => `Massimo ${stamp}`,
    penumbralMagnitude: (value) => `magnitudine penombrale ${value}`,
    penumbralPhase: (duration, span) => `fase penombrale ${duration} (${span})`,
    umbralMagnitude: (value) => `magnitudine d’ombra ${value}`,
    totality: (duration, span) => `totalità ${duration} (${span})`,
    inUmbra: (duration, span) => `nell’ombra ${duration} (${span})`,
    timesIn: (zone) => `Orari in ${zone}, 24 ore, arrotondati al minuto; «+1 giorno»: il giorno dopo la data del titolo.`,
    shadow: (convention, deltaT) => `Ombra: convenzione di ${convention}; ΔT ${deltaT}.`,
    moonUp: 'Luna sopra l’orizzonte: bordo superiore sopra un orizzonte al livello del mare, con rifrazione standard.',
    credits: (basemap, font, generator) => `${basemap}. Carattere: ${font}. Realizzato con ${generator}.`,
  },
  legend: {
    zonesOf: { penumbral: 'l’eclissi', umbral: 'la fase d’ombra' },
    codesP: 'P1/P4 la Luna entra nell’ombra esterna (penombra) / ne esce',
    codesU: 'U1/U4 l’ombra',
    codesTotality: 'U2/U3 inizio/fine della totalità',
    zoneAll: (phase) => `Luna sopra l’orizzonte per tutta ${phase}`,
    zoneSets: (phase) => `La Luna tramonta durante ${phase}`,
    zoneRises: (phase) => `La Luna sorge durante ${phase}`,
    zoneNone: 'Luna sotto l’orizzonte per tutto il tempo',
    // `phase` carries its article ("l’eclissi", "la fase d’ombra"): "de" + it reads "dell’eclissi", "della fase d’ombra".
    boundaryStrong: (phase) => `Sorgere/tramonto della Luna all’inizio e alla fine de${phase.replace(/^l/, 'll')}`,
    boundaryLight: 'in altre fasi',
    countedPhase: { totality: 'totalità', umbral: 'fase d’ombra', penumbral: 'fase penombrale' },
    field: (phase) => `minuti di ${phase} con la Luna sopra l’orizzonte`,
    centre: 'Luna allo zenit al massimo',
    townOwnClock: 'località segnata: la fase chiave nella sua ora locale',
    town: 'località segnata: la fase chiave',
    codes: (codes) => `piccole etichette sulle linee: ${codes}`,
  },
  mark: { greatest: 'massimo', rises: 'sorge', sets: 'tramonta', notSeen: 'non visibile' },
  stage: {
    P1: 'all’inizio della debole ombra esterna',
    P1Penumbral: 'all’inizio dell’eclissi',
    U1: 'all’inizio dell’eclissi parziale',
    U2: 'all’inizio della totalità',
    greatest: 'al massimo',
    U3: 'alla fine della totalità',
    U4: 'alla fine dell’eclissi parziale',
    P4: 'alla fine della debole ombra esterna',
    P4Penumbral: 'alla fine dell’eclissi',
  },
  boundaryLabel: (rising, stage, time) => `La Luna ${rising ? 'sorge' : 'tramonta'} ${stage} · ${time}`,
  sky: {
    classes: { day: 'giorno', civil: 'crepuscolo civile', nautical: 'crepuscolo nautico', astronomical: 'crepuscolo astronomico', night: 'notte' },
    phases: { penumbral: 'fase penombrale', partial: 'fase parziale', total: 'totalità' },
    horizon: 'orizzonte',
    kinds: { total: 'totale', partial: 'parziale', penumbral: 'penombrale' },
    eventName: { greatest: 'Massimo', moonrise: 'Sorgere della Luna', moonset: 'Tramonto della Luna' },
    title: (kind, place, date) => `L’eclissi ${kind} di Luna vista da ${place} · ${date}`,
    localTime: (zone) =>
      `Ora locale: ${zone}, 24 ore. Altezza del centro della Luna con rifrazione standard, sopra un orizzonte al livello del mare; lettere sotto il percorso: dove guardare (punto cardinale, p. es. ESE = est-sud-est).`,
    shadow: (convention, deltaT, source) => `Ombra: convenzione di ${convention}; ΔT ${deltaT.toFixed(1)} s (${source}).`,
    credits: (places, font, generator) => `${places} Carattere: ${font}. Realizzato con ${generator}.`,
    altText: (place) =>
      `Grafico dell’altezza della Luna sopra l’orizzonte nel corso della notte ${/^[aA]/.test(place) ? 'ad' : 'a'} ${place}, con l’ora locale in basso, le fasi dell’eclissi segnate sul percorso e il crepuscolo sullo sfondo.`,
    file: (title, summary, alt) => `${title}. ${summary}\n\nTesto alternativo: ${alt}\n`,
  },
};

/** Lo schema della Luna attraverso l’ombra della Terra, la sua didascalia e il titolo del riquadro sulla mappa. */
const DIAGRAM: LunarDiagramWords = {
  common: COMMON_ITALIAN,
  moments: {
    P1: 'tocca la penombra',
    U1: 'tocca l’ombra',
    U2: 'tutta dentro l’ombra',
    // "ombra" alone is the umbra in these words; greatest is where the Moon passes nearest the shadow's centre.
    greatest: 'più vicina al centro dell’ombra terrestre',
    U3: 'inizia a uscire dall’ombra',
    U4: 'fuori dall’ombra',
    P4: 'fuori dalla penombra',
  },
  legend: {
    penumbra: 'penombra: parte del Sole nascosta',
    umbra: 'ombra: tutto il Sole nascosto',
    moonAtGreatest: 'la Luna al massimo',
    moonAtContact: 'la Luna a ogni contatto',
    path: 'il percorso della Luna; la freccia: il verso del moto',
  },
  compass: { north: 'N', east: 'E' },
  greatest: 'Massimo',
  moonAcross: (arcmin) => `diametro della Luna: ${arcmin}′`,
  timesHeading: (zone) => `Orari (${zone ?? 'ciascuno con il suo fuso'})`,
  kindTitle: { total: 'totale', partial: 'parziale', penumbral: 'penombrale' },
  title: (kindTitle, date) => `Eclissi ${kindTitle} di Luna ${ofDate(date)}: attraverso l’ombra della Terra`,
  shortTitle: (kindTitle, date) => `Eclissi ${kindTitle} di Luna ${ofDate(date)}`,
  depth: { penumbral: (m) => `magnitudine penombrale ${m}`, umbral: (m) => `magnitudine d’ombra ${m}` },
  longest: { totality: (d) => `totalità ${d}`, partial: (d) => `fase parziale ${d}`, penumbral: (d) => `fase penombrale ${d}` },
  subtitle: (time, depth, longest, zone) => `Il percorso della Luna nell’ombra terrestre, con il massimo alle ${time} (${depth}, ${longest}). Orari: ${zone}.`,
  smallPrint: {
    frame: 'Vista dal centro della Terra, con l’ombra tenuta ferma: la linea è il percorso calcolato della Luna rispetto a essa.',
    orientation: 'Nord in alto, verso il polo celeste della data; est a sinistra, come appare il cielo a chi lo guarda.',
    shadow: (convention, deltaT, source, gamma) => `Ombra: convenzione di ${convention}, cerchi al massimo; ΔT ${deltaT} s (${source}); gamma ${gamma}.`,
    credits: (font, generator) => `Carattere: ${font}. Realizzato con ${generator}.`,
  },
  nakedEye: meantOnlyFor('lunar', 'Un’eclissi di Luna si può osservare senza rischi a occhio nudo.'),
  caption: {
    wholly: (from, to) => ` È tutta dentro l’ombra dalle ${from} alle ${to}.`,
    partly: (from, to) => ` È in parte dentro l’ombra dalle ${from} alle ${to}.`,
    never: ' Non raggiunge mai l’ombra.',
    summary: (p1, greatest, p4, inner) => `La Luna entra nella penombra della Terra alle ${p1}, passa più vicina al centro dell’ombra terrestre alle ${greatest} e ne esce alle ${p4}.${inner}`,
    altText: (side) =>
      `Schema di due cerchi concentrici, la penombra della Terra, più chiara, attorno all’ombra, più scura, attraversati da destra a sinistra dal percorso della Luna, che passa a ${side === 'north' ? 'nord' : 'sud'} del centro; la Luna è disegnata dove ogni fase inizia e finisce e al massimo, ciascuna con il suo orario. Nord in alto, est a sinistra.`,
    file: (title, summary, altText) => `${title}. ${summary}\n\nTesto alternativo: ${altText}\n`,
  },
  inset: { heading: 'Attraverso l’ombra · N in alto, E a sinistra' },
};

export const LUNAR_ITALIAN: LunarWords = {
  body: 'lunar',
  common: COMMON_ITALIAN,
  figures: FIGURES,
  diagram: DIAGRAM,
  kindTitle: { total: 'totale', partial: 'parziale', penumbral: 'penombrale' },
  kind: { total: 'totale', partial: 'parziale', penumbral: 'penombrale' },
  convention: { danjon: 'Danjon', chauvenet: 'Chauvenet' },
  nakedEyeInCalendar: meantOnlyFor('lunar', 'Si può osservare senza rischi a occhio nudo; sono previsioni, tempo permettendo.'),
  table: {
    kind: { total: 'totale', partial: 'parziale', penumbral: 'penombrale' },
    catalogueHeader: ['Data', 'Tipo', 'Massimo (UTC)', 'Mag. d’ombra', 'Mag. penombrale', 'Gamma', 'Nell’ombra', 'Totalità', 'Saros'],
    absent: '–',
    julianBeside: (isoDate, julianDate) => `${isoDate} (giuliano: ${julianDate})`,
    eclipses: (count) => counted(count, 'eclissi di Luna', 'eclissi di Luna'),
    catalogueTitle: (counted, from, to) => `${counted} dal ${from} al ${to} (escluso)`,
    catalogueTimes: (convention, julianNote) => `Orari in UTC, arrotondati al minuto. Ombra: convenzione di ${convention}.${julianNote}`,
    catalogueJulian: ' Date: calendario gregoriano prolettico; prima del 15 ottobre 1582 segue la data giuliana.',
    deltaTSpan: ([least, most]) => (least === most ? `${least.toFixed(1)} s` : `${least.toFixed(1)}–${most.toFixed(1)} s`),
    deltaTNote: (span, sources, model) => `ΔT ${span} (${sources}; modello: ${model}).`,
    deltaTModelOnly: (model) => `Modello di ΔT: ${model}.`,
  },
  local: {
    events: {
      P1: 'la Luna entra nella penombra',
      U1: 'inizia l’eclissi parziale',
      U2: 'inizia la totalità',
      greatest: 'massimo dell’eclissi',
      U3: 'finisce la totalità',
      U4: 'finisce l’eclissi parziale',
      P4: 'la Luna esce dalla penombra',
      moonrise: 'sorgere della Luna',
      moonset: 'tramonto della Luna',
    },
    eventLabel: { greatest: 'Massimo', moonrise: 'Sorgere', moonset: 'Tramonto' },
    header: (zone) => ['Evento', 'Che cosa accade', `Locale (${zone})`, 'UTC', 'Alt. Luna', 'Az. Luna', 'Luna visibile', 'Alt. Sole', 'Cielo'],
    yes: 'sì',
    no: 'no',
    sky: { day: 'giorno', civil: 'civile', nautical: 'nautico', astronomical: 'astronomico', night: 'notte' },
    title: (kindTitle, id, julianDate, place, coordinates, zone) =>
      `Eclissi ${kindTitle} di Luna ${id}${julianDate ? ` (giuliano: ${julianDate})` : ''} vista da ${place} (${coordinates}; ${zone})`,
    timeNote: (zone, julianNote) =>
      `Ora locale: ${zone}. Orari arrotondati al minuto. Altezza della Luna: quella del centro, con rifrazione da −1° veri in su, geometrica sotto; «visibile»: bordo superiore sopra un orizzonte al livello del mare.${julianNote}`,
    julianNote: ' Date: calendario gregoriano prolettico (accanto alla data dell’eclissi è indicata quella giuliana).',
    shadowNote: (convention, deltaT, source, predictions) => `Ombra: convenzione di ${convention}; ΔT ${deltaT.toFixed(1)} s (${source}). ${predictions}`,
  },
  calendar: {
    phaseTitle: { penumbral: 'Eclissi penombrale di Luna', partial: 'Fasi parziali dell’eclissi di Luna', total: 'Totalità' },
    cutToMoonUp: ' (la parte con la Luna sopra l’orizzonte)',
    cutToMoonUpShort: ' (Luna visibile)',
    description: (title, id, cut, summary, nakedEye) => `${title} del ${id}${cut}. ${summary} ${nakedEye}`,
    notSeenTitle: (place) => `Eclissi di Luna, non visibile da ${place}`,
    notSeenDescription: (summary) => `${summary} Questa voce segna solo la data: da qui non c’è nulla da vedere.`,
  },
  summary: {
    compass: ['nord', 'nord-est', 'est', 'sud-est', 'sud', 'sud-ovest', 'ovest', 'nord-ovest'],
    position: (altitudeDeg, direction) => `${altitudeDeg < 15 ? 'bassa a' : altitudeDeg < 45 ? 'a' : 'alta a'} ${direction}`,
    aboveHorizon: (degrees) => `a ${degrees}° sopra l’orizzonte`,
    phaseState: {
      before: 'prima che l’eclissi inizi',
      penumbral: 'nella debole fase penombrale',
      partial: 'in parte eclissata',
      total: 'totalmente eclissata',
      after: 'a eclissi ormai finita',
    },
    contacts: { U1: 'inizia la fase parziale', U2: 'inizia la totalità', U3: 'finisce la totalità', U4: 'finisce la fase parziale' },
    penumbralContacts: { P1: 'inizia la fase penombrale', P4: 'finisce la fase penombrale' },
    from: (place) => `Da ${place}`,
    notSeen: 'l’eclissi non si vede: la Luna resta sotto l’orizzonte dall’inizio alla fine.',
    daylight: ' Una parte avviene di giorno, quando la Luna è difficile da vedere.',
    rises: 'sorge',
    risesAgain: 'sorge di nuovo',
    sets: 'tramonta',
    moves: (verb, time, direction, state) => `la Luna ${verb} alle ${time}${direction === undefined ? '' : ` a ${direction}`}, ${state}`,
    mainSpan: (penumbral, span, totality, where) =>
      `${penumbral ? 'fase penombrale' : 'fasi parziali'} ${span}${totality === undefined ? '' : `, totalità ${totality}`}, con la Luna ${where} al massimo`,
    greatestAt: (time, where) => `massimo dell’eclissi alle ${time}, con la Luna ${where}`,
    contactAt: (contact, time) => `${contact} alle ${time}`,
    inView: {
      wholePenumbral: 'si vede tutta l’eclissi penombrale',
      whole: 'si vede tutta l’eclissi',
      partPenumbral: 'si vede parte dell’eclissi penombrale',
      allPartialAndTotality: 'si vedono tutte le fasi parziali e la totalità',
      allPartial: 'si vede tutta la fase parziale',
      onlyPenumbral: 'si vede solo la debole fase penombrale',
      partPartial: 'si vede parte della fase parziale',
      allTotalityPartPartial: 'si vede tutta la totalità e parte delle fasi parziali',
      partTotality: 'si vede parte della totalità',
      partPartialNoTotality: 'si vede parte della fase parziale, ma non la totalità',
    },
  },
  caption: {
    title: (kindTitle, date) => `Eclissi ${kindTitle} di Luna ${ofDate(date)}.`,
    penumbralFacts: (stamp, magnitude, duration, span) =>
      `Massimo dell’eclissi alle ${stamp}, magnitudine penombrale ${magnitude}; la Luna resta ${duration} nella penombra (${span}), un lieve oscuramento.`,
    umbralFacts: (stamp, magnitude, totality, duration, span) =>
      `Massimo dell’eclissi alle ${stamp}, magnitudine d’ombra ${magnitude}${totality ? `; la totalità dura ${totality.duration} (${totality.span})` : ''}; la Luna resta ${duration} nell’ombra (${span}).`,
    zone: {
      'sees-all': 'Visibile dall’inizio alla fine in',
      'sets-during': 'La Luna tramonta durante l’eclissi in',
      'rises-during': 'La Luna sorge durante l’eclissi in',
    },
    zoneInAltText: {
      'sees-all': 'dall’inizio alla fine in',
      'sets-during': 'la Luna tramonta durante l’eclissi in',
      'rises-during': 'la Luna sorge durante l’eclissi in',
    },
    // Every continent's name starts with a vowel: "dell’" fits them all.
    continent: (name, share) => (share === 'whole' ? name : share === 'most' ? `gran parte dell’${name}` : `parte dell’${name}`),
    somewhere: 'alcune parti del mondo',
    including: (names) => `, tra cui ${names}`,
    hidden: (where) => `Non è visibile in ${where}.`,
    altText: (kind, date, parts, hidden) => `Mappa del mondo che mostra dove si vede l’eclissi ${kind} di Luna ${ofDate(date)}: ${parts}${hidden === undefined ? '' : `; non in ${hidden}`}.`,
    file: (caption, altText) => `${caption}\n\nTesto alternativo: ${altText}\n`,
  },
  sheet: {
    title: (from, last) => `Eclissi di Luna dal ${from} al ${last}`,
    roles: { map: 'mappa', caption: 'didascalia', thumbnail: 'miniatura', local: 'tabella locale', sky: 'vista da qui', diagram: 'schema' },
    fileNote: (role, kib) => `${role}, ${kib} KiB`,
    greatestUtc: (hhmm) => `Massimo ${hhmm} UTC`,
    greatestLocal: (stamp) => `Massimo ${stamp}`,
    penumbralMagnitude: (value) => `magnitudine penombrale ${value}`,
    umbralMagnitude: (value) => `magnitudine d’ombra ${value}`,
    totality: (duration) => `totalità ${duration}`,
    inUmbra: (duration) => `nell’ombra ${duration}`,
    penumbralPhase: (duration) => `fase penombrale ${duration}`,
    saros: (n) => `saros ${n}`,
    // On a sheet holding both kinds the card's kind already says "di Luna" (the solar words' lunarKind): said once.
    thumbnailAlt: (kind, date) => `Mappa di visibilità dell’eclissi ${kind.replace(/ di Luna$/, '')} di Luna ${ofDate(date)}`,
    eclipses: (count) => counted(count, 'eclissi', 'eclissi'),
    header: (counted, zone, styleHash, tool) => `${counted} · date e orari in ${zone} · stile ${styleHash} · ${tool}`,
    credits: 'Mappa di base: Natural Earth tramite world-atlas (pubblico dominio). Luoghi: GeoNames (CC BY 4.0). Vedi manifest.json e catalogue.csv.',
  },
};
