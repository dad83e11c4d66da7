/**
 * L’avvertenza per la sicurezza degli occhi durante le eclissi di Sole, in
 * italiano, con tutto il contenuto di quella inglese (caution.ts): filtri ISO
 * 12312-2 o proiezione; mai una fase parziale o anulare senza protezione; la
 * totalità, solo nella fascia; strumenti con filtro anteriore; bambini
 * accompagnati; le autorità sanitarie locali.
 */
import { COMMON_ITALIAN } from '../common/it.ts';
import { decimalIn, listWords } from '../common.ts';
import type { SolarWords } from './caution.ts';
import type { SolarKindWord, SolarTextWords } from './text.ts';

const list = (items: readonly string[]) => listWords(items, COMMON_ITALIAN);
const number = (text: string) => decimalIn(text, COMMON_ITALIAN);

/** "del 12 agosto 2026", "dell’8 aprile 2024", "dell’11 luglio 1991": the article elides before a number read with a vowel (otto, undici). */
export const ofDate = (date: string) => (/^(8|11)\s/.test(date) ? `dell’${date}` : `del ${date}`);
/** "il 63 %", "l’80 %", "l’8 %", "l’1 %": the article before a percentage, elided before uno, otto, undici, ottanta… */
export const thePercent = (percent: string) => (/^(1|8|11|8\d)(\D|$)/.test(percent) ? `l’${percent}` : `il ${percent}`);

/** "eclissi totale di Sole"; the hybrid kind says what it is in brackets, after the noun. */
const KIND: Record<SolarKindWord, string> = { total: 'totale', annular: 'anulare', hybrid: 'ibrida', partial: 'parziale' };
const eclipseOfTheSun = (kind: SolarKindWord) => `eclissi ${KIND[kind]} di Sole${kind === 'hybrid' ? ' (totale e anulare)' : ''}`;
/** The band on the ground, every name feminine (la fascia). */
const PATH_NAME = {
  total: 'fascia di totalità',
  annular: 'fascia di anularità',
  hybrid: 'fascia centrale (totale in alcuni tratti, anulare in altri)',
} as const;

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
    continent: (name, share) => (share === 'whole' ? `tutta l’${name}` : share === 'most' ? `gran parte dell’${name}` : `parte dell’${name}`),
    partialSeen: (where) => `L’eclissi parziale è visibile in ${where}.`,
    citiesIntro: 'Tra le città più grandi:',
    cityCentral: (city, kind, duration, from) => `${city} vede ${kind === 'total' ? 'la totalità' : 'l’anello'} per ${duration} dalle ${from}`,
    cityPartial: (city, percent, at, when) =>
      when === 'maximum' ? `${city} vede la Luna coprire ${thePercent(percent)} del Sole alle ${at}`
        : `${city} vede ${when === 'sunrise' ? 'sorgere' : 'tramontare'} il Sole coperto per ${thePercent(percent)}, alle ${at}`,
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
    noMap: 'Didascalia e geometria GeoJSON; per ora nessuna immagine della mappa.',
  },
};

export const SOLAR_ITALIAN: SolarWords = {
  body: 'solar',
  common: COMMON_ITALIAN,
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
