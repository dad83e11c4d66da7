/**
 * O aviso de segurança ocular dos eclipses do Sol, em português, com todo o
 * conteúdo do inglês (caution.ts): filtros ISO 12312-2 ou projeção; nunca uma
 * fase parcial ou anular sem proteção; a totalidade, só dentro da faixa;
 * instrumentos com filtro frontal; crianças acompanhadas; as autoridades de
 * saúde locais.
 */
import { COMMON_PORTUGUESE } from '../common/pt.ts';
import { decimalIn, listWords } from '../common.ts';
import type { SolarWords } from './caution.ts';
import type { SolarKindWord, SolarTextWords } from './text.ts';

const list = (items: readonly string[]) => listWords(items, COMMON_PORTUGUESE);
const number = (text: string) => decimalIn(text, COMMON_PORTUGUESE);

/** "eclipse total do Sol"; the hybrid kind says what it is in brackets, after the noun. */
const KIND: Record<SolarKindWord, string> = { total: 'total', annular: 'anular', hybrid: 'híbrido', partial: 'parcial' };
const eclipseOfTheSun = (kind: SolarKindWord) => `eclipse ${KIND[kind]} do Sol${kind === 'hybrid' ? ' (total e anular)' : ''}`;
/** The band on the ground, every name feminine (a faixa): the article "A" fits each. */
const PATH_NAME = {
  total: 'faixa de totalidade',
  annular: 'faixa do eclipse anular',
  hybrid: 'faixa central (total nuns pontos, anular noutros)',
} as const;

/**
 * As legendas, os acontecimentos locais e a folha de contactos dos eclipses
 * do Sol. Country names are listed after a colon, never after a verb: most
 * take an article in Portuguese ("a Islândia", "os Estados Unidos"), and the
 * list of names cannot know which.
 */
export const SOLAR_TEXT_PORTUGUESE: SolarTextWords = {
  common: COMMON_PORTUGUESE,
  events: {
    C1: 'a Lua começa a cobrir o Sol',
    C2: 'começa a fase central',
    maximum: 'máximo do eclipse',
    C3: 'termina a fase central',
    C4: 'a Lua deixa de cobrir o Sol',
    sunrise: 'nascer do Sol',
    sunset: 'pôr do Sol',
  },
  central: { total: 'totalidade', annular: 'fase anular' },
  caption: {
    title: (kind, date) => `${eclipseOfTheSun(kind).replace(/^e/, 'E')} de ${date}.`,
    greatest: (stamp, where, alt) =>
      `Máximo do eclipse às ${stamp} perto de ${where}, ${Math.round(alt) <= 0 ? 'com o Sol no horizonte' : `com o Sol a ${Math.round(alt)}° de altura`}.`,
    centralFacts: (kind, duration, width) => {
      const what = kind === 'annular' ? 'o anel de luz solar dura' : kind === 'total' ? 'a totalidade dura' : 'a fase central dura';
      const parts = [duration ? `${what} ${duration}` : undefined, width !== undefined ? `a faixa tem ${Math.round(width)} km de largura` : undefined].filter((p) => p !== undefined);
      return parts.length > 0 ? `Nesse ponto, ${list(parts)}.` : '';
    },
    nonCentral: (kind) => `O eixo da sombra não chega à Terra: a ${kind === 'total' ? 'umbra' : 'antumbra'} apenas a toca de raspão junto a um dos polos.`,
    partialOnly: (magnitude) => `Só a penumbra da Lua atinge a Terra: o eclipse é parcial em toda a parte, de magnitude máxima ${number(magnitude)}.`,
    pathCrosses: (kind, countries, more) => {
      const names = more > 0 ? [...countries, `mais ${more === 1 ? 'um' : more}`] : countries;
      return `${countries.length + more === 1 ? 'País atravessado' : 'Países atravessados'} pela ${PATH_NAME[kind]}: ${list(names)}.`;
    },
    pathOverSea: (kind) => `A ${PATH_NAME[kind]} passa apenas por mar aberto, sem tocar terra de nenhum país.`,
    // "toda a Europa", "grande parte da Ásia", "partes da África": every continent's name is feminine.
    continent: (name, share) => (share === 'whole' ? `toda a ${name}` : share === 'most' ? `grande parte da ${name}` : `partes da ${name}`),
    partialSeen: (where) => `Vê-se um eclipse parcial em ${where}.`,
    citiesIntro: 'Entre as maiores cidades:',
    cityCentral: (city, kind, duration, from) => `${city} vê ${kind === 'total' ? 'a totalidade' : 'o anel'} durante ${duration}, a partir das ${from}`,
    cityPartial: (city, percent, at, when) =>
      when === 'maximum' ? `${city} vê a Lua cobrir ${percent} do Sol às ${at}`
        : `${city} vê o Sol ${when === 'sunrise' ? 'nascer' : 'pôr-se'} com ${percent} do disco coberto, às ${at}`,
    altText: (kind, date, path, partial) => [`Mapa do ${eclipseOfTheSun(kind)} de ${date}.`, path, partial].filter((p) => p).join(' '),
    file: (caption, alt) => `${caption}\n\nTexto alternativo: ${alt}\n`,
  },
  sheet: {
    title: (lunarToo, from, last) => `Eclipses ${lunarToo ? 'da Lua e do Sol' : 'do Sol'} de ${from} a ${last}`,
    kind: { total: 'total do Sol', annular: 'anular do Sol', hybrid: 'híbrido do Sol', partial: 'parcial do Sol' },
    magnitude: (value) => `magnitude ${number(value)}`,
    central: (kind, duration) => `${kind === 'total' ? 'totalidade' : kind === 'annular' ? 'fase anular' : 'fase central'} ${duration} no máximo`,
    width: (km) => `faixa de ${km} km de largura`,
    saros: (n) => `saros ${n}`,
    noMap: 'Legenda e geometria GeoJSON; ainda sem imagem do mapa.',
  },
};

export const SOLAR_PORTUGUESE: SolarWords = {
  body: 'solar',
  common: COMMON_PORTUGUESE,
  caution: {
    long: {
      viewers: 'Olhe para o Sol apenas através de óculos de eclipse ou visores de mão que cumpram a norma ISO 12312-2, ou observe a sua imagem projetada num cartão.',
      neverUnprotected: 'Nunca olhe para uma fase parcial ou anular sem proteção, por mais que o Sol esteja coberto: mesmo uma fina nesga de Sol pode ferir os olhos.',
      totality: 'Só dentro da faixa de totalidade, e só enquanto a Lua esconde o Sol por completo, se podem tirar os visores; volte a colocá-los logo à primeira luz intensa.',
      noTotality: 'Fora da faixa de totalidade, em nenhum momento é seguro olhar sem filtro.',
      optics: 'Binóculos, telescópios e câmaras precisam de um filtro solar adequado colocado na frente do instrumento; nunca olhe através deles apenas com óculos de eclipse.',
      children: 'As crianças devem observar sempre acompanhadas por um adulto.',
      authorities: 'Siga as recomendações das autoridades de saúde locais.',
    },
    short: {
      viewers: 'Segurança ocular: observe apenas com visores de eclipse ISO 12312-2 ou por projeção; nunca olhe para uma fase parcial ou anular sem proteção, por mais que o Sol esteja coberto.',
      totality: 'Visores fora só enquanto a totalidade esconde o Sol por completo, de novo postos à primeira luz intensa.',
      noTotality: 'Fora da faixa de totalidade, em nenhum momento é seguro olhar sem filtro.',
      both: 'Dentro da faixa, visores fora só enquanto a totalidade esconde o Sol por completo, de novo postos à primeira luz intensa; fora dela, em nenhum momento é seguro olhar sem filtro.',
      rest: 'Nada de binóculos, telescópios ou câmaras sem filtro solar frontal. Crianças sempre acompanhadas; siga as indicações de saúde locais.',
    },
  },
};
