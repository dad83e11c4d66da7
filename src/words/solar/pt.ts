/**
 * Os eclipses do Sol em português: o aviso de segurança ocular, com todo o
 * conteúdo do inglês (filtros ISO 12312-2 ou projeção; nunca uma fase parcial
 * ou anular sem proteção; a totalidade, só dentro da faixa; instrumentos com
 * filtro frontal; crianças acompanhadas; as autoridades de saúde locais), as
 * palavras do mapa, do diagrama, das legendas, da tabela local, do resumo e
 * do calendário. Reviewed wording, consistent with the lunar catalogue
 * (lunar/pt.ts): the trade's contact names (C1…C4), ΔT and saros stay as
 * astronomers write them; "faixa de totalidade" as in the caution.
 */
import { COMMON_PORTUGUESE } from '../common/pt.ts';
import { decimalIn, listWords } from '../common.ts';
import type { SolarWords } from './caution.ts';
import type { SolarDiagramWords } from './diagram.ts';
import type { SolarFigureWords } from './figures.ts';
import type { SolarKindWord, SolarTextWords } from './text.ts';

// The plural rules of the Portuguese this catalogue is written in ("0 eclipses"; CLDR's bare "pt" counts 0 as singular).
const plural = new Intl.PluralRules('pt-PT');
const counted = (count: number, one: string, other: string) => `${count} ${plural.select(count) === 'one' ? one : other}`;
const list = (items: readonly string[]) => listWords(items, COMMON_PORTUGUESE);
const number = (text: string) => decimalIn(text, COMMON_PORTUGUESE);
/** The Sun's altitude below the horizon, said as a depth: "com o Sol 4° abaixo do horizonte". */
const belowHorizon = (altitude: string) => {
  const depth = altitude.replace(/^[-−]/, '');
  return /^0(\D|$)/.test(depth) ? 'com o Sol no horizonte' : `com o Sol ${depth}° abaixo do horizonte`;
};
/** "de Oviedo", but "do ponto de máximo": the figure's own name for a place carries its article, which contracts. */
const fromPlace = (place: string) => (place.startsWith('o ') ? `do ${place.slice(2)}` : `de ${place}`);
/** A position written "65.22°N 25.28°W" put in this language's decimal sign and hemisphere letters: "65,22°N, 25,28°O". */
const position = (text: string) => text.replace(/(\d+(?:\.\d+)?)°([NS]),? (\d+(?:\.\d+)?)°([EW])/, (_all, lat: string, ns: string, lon: string, ew: string) =>
  `${number(lat)}°${ns === 'N' ? COMMON_PORTUGUESE.hemispheres.north : COMMON_PORTUGUESE.hemispheres.south}, ${number(lon)}°${ew === 'E' ? COMMON_PORTUGUESE.hemispheres.east : COMMON_PORTUGUESE.hemispheres.west}`);
/** A share that rounds to "0 %" is said as less than one percent. */
const underOne = (percent: string) => (/^0(\D|$)/.test(percent) ? 'menos de 1 %' : percent);

/** "eclipse total do Sol"; the hybrid kind says what it is in brackets, after the noun. */
const KIND: Record<SolarKindWord, string> = { total: 'total', annular: 'anular', hybrid: 'híbrido', partial: 'parcial' };
const eclipseOfTheSun = (kind: SolarKindWord) => `eclipse ${KIND[kind]} do Sol${kind === 'hybrid' ? ' (total e anular)' : ''}`;
/** The band on the ground, every name feminine (a faixa): the article "A" fits each. */
const PATH_NAME = {
  total: 'faixa de totalidade',
  annular: 'faixa do eclipse anular',
  hybrid: 'faixa central (total nuns pontos, anular noutros)',
} as const;

const FIGURES: SolarFigureWords = {
  common: COMMON_PORTUGUESE,
  kindTitle: { total: 'Eclipse total do Sol', annular: 'Eclipse anular do Sol', hybrid: 'Eclipse híbrido do Sol', partial: 'Eclipse parcial do Sol' },
  kindInSentence: { total: 'eclipse total do Sol', annular: 'eclipse anular do Sol', hybrid: 'eclipse híbrido do Sol', partial: 'eclipse parcial do Sol' },
  centralPhase: { total: 'totalidade', annular: 'fase anular', hybrid: 'fase central' },
  minutesSeconds: { minutes: (minutes, seconds) => `${minutes} min ${seconds} s`, seconds: (seconds) => `${seconds} s` },
  percentText: { percent: (value) => `${value} %`, underOne: 'menos de 1 %' },
  map: {
    title: (kindTitle, date) => `${kindTitle} · ${date}`,
    greatest: (stamp, coordinates) => `Máximo ${stamp} em ${coordinates}`,
    magnitude: (value) => `magnitude ${value}`,
    centralOnLine: (phase, duration) => `${phase} de ${duration} na linha central`,
    pathWidth: (km) => `faixa de ${km} km de largura`,
    separator: ' · ',
    timesIn: (zone) => `Horas em ${zone}, relógio de 24 horas; «+1 dia»: o dia seguinte à data do título.`,
    shading: 'Sombreado: a maior fração do disco solar oculta com o Sol acima do horizonte (bordo superior acima de um horizonte ao nível do mar, com refração padrão).',
    moonRadii: (k1, k2) => `raio da Lua k1 = ${k1} (fases parciais), k2 = ${k2} (faixa)`,
    elements: (deltaT, source, moonRadii) =>
      `Elementos besselianos calculados com astronomy-engine; ΔT ${deltaT} s (${source}); ${moonRadii}; bordo da Lua tomado como liso: os limites da faixa podem deslocar-se um quilómetro ou mais.`,
    credits: (basemap, font, generator) => `${basemap}. Tipo de letra: ${font}. Feito com ${generator}.`,
  },
  legend: {
    ramp: ['menos de 20 % do Sol oculto', '20–40 %', '40–60 %', '60–80 %', 'mais de 80 % (Sol visível)'],
    path: { total: 'Faixa de totalidade', annular: 'Faixa do eclipse anular', hybrid: 'Faixa (total ou anular)' },
    centralLine: (clock) => `Linha central, horas em ${clock}`,
    pathLimits: 'Limites da faixa',
    partialLimits: 'Limites do eclipse parcial',
    riseSet: 'Eclipse em curso ao nascer ou ao pôr do Sol',
    greatest: 'Máximo do eclipse',
    contours: 'Mesma fração do Sol oculta',
    town: 'Localidade marcada',
  },
  riseSet: (contact, sun) => `${contact === 'C1' ? 'começa' : 'termina'} ao ${sun === 'sunrise' ? 'nascer' : 'pôr'} do Sol`,
  mark: {
    notSeen: (name) => `${name} · não visível`,
    central: (name, kind, time, duration) => `${name} · ${kind === 'total' ? 'total' : 'anular'} ${time}${duration !== undefined ? `, ${duration}` : ''}`,
    partial: (name, percent, time, at) => `${name} · ${percent} ${at === undefined ? 'às' : at === 'sunrise' ? 'ao nascer do Sol,' : 'ao pôr do Sol,'} ${time}`,
  },
  caption: {
    path: (kind) => ` A banda escura é a ${PATH_NAME[kind]}, com a sua linha central e as horas.`,
    facts: (kind, date, subtitle) => `${kind.replace(/^e/, 'E')} de ${date}. ${subtitle}.`,
    shading: (path) => `O sombreado mostra que parte do Sol fica oculta, no máximo, com o Sol acima do horizonte.${path}`,
    altText: (kind, date, path) => `Mapa do ${kind} de ${date}: o sombreado, mais escuro onde o Sol fica mais oculto, marca onde se vê o eclipse parcial.${path}`,
    file: (caption, altText) => `${caption}\n\nTexto alternativo: ${altText}\n`,
  },
};

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
    // A continent's English name (countries-list's) is put into Portuguese here; a name already translated passes as it is.
    continent: (english, share) => {
      const name = (COMMON_PORTUGUESE.continents as Readonly<Record<string, string>>)[english] ?? english;
      return share === 'whole' ? `toda a ${name}` : share === 'most' ? `grande parte da ${name}` : `partes da ${name}`;
    },
    partialSeen: (where) => `Vê-se um eclipse parcial em ${where}.`,
    citiesIntro: 'Entre as maiores cidades:',
    cityCentral: (city, kind, duration, from) => `${city} vê ${kind === 'total' ? 'a totalidade' : 'o anel'} durante ${duration}, a partir das ${from}`,
    cityPartial: (city, percent, at, when) =>
      when === 'maximum' ? `${city} vê a Lua cobrir ${underOne(percent)} do Sol às ${at}`
        : `${city} vê o Sol ${when === 'sunrise' ? 'nascer' : 'pôr-se'} com ${underOne(percent)} do disco coberto, às ${at}`,
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
    noMap: 'Legenda e geometria GeoJSON; o estilo não pede imagem do mapa.',
    // `kind` is one of `kind` above: "Mapa do eclipse total do Sol de 12 de agosto de 2026".
    thumbnailAlt: (kind, date) => `Mapa do eclipse ${kind} de ${date}`,
    lunarKind: (kind) => `${kind} da Lua`,
  },
  list: {
    header: ['Data', 'Astro', 'Tipo', 'Máximo (UTC)', 'Magnitude', 'Mag. penumbral', 'Gama', 'Na umbra', 'Totalidade', 'Central', 'Faixa', 'Saros'],
    body: { lunar: 'Lua', solar: 'Sol' },
    kind: { total: 'total', annular: 'anular', hybrid: 'híbrido', partial: 'parcial' },
    eclipses: (lunar, solar) => `${counted(lunar, 'eclipse da Lua', 'eclipses da Lua')} e ${counted(solar, 'eclipse do Sol', 'eclipses do Sol')}`,
    solarEclipses: (count) => counted(count, 'eclipse do Sol', 'eclipses do Sol'),
    magnitudeNote: 'Magnitude: para a Lua, a da umbra; para o Sol, a fração do seu diâmetro coberta, no ponto de máximo do eclipse.',
    solarNote: (k1, k2) =>
      `Sol: central = totalidade ou fase anular na linha central, no máximo do eclipse; faixa = a sua largura nesse ponto; raio da Lua k1 = ${k1} (penumbra), k2 = ${k2} (umbra e antumbra).`,
    central: (minutes, seconds) => `${minutes}min ${seconds}s`,
    pathWidth: (km) => `${km} km`,
  },
  minutesSeconds: { minutes: (minutes, seconds) => `${minutes} min ${seconds} s`, seconds: (seconds) => `${seconds} s` },
  percent: (value) => `${value} %`,
  // Every central phase named here is feminine: "começa a totalidade", "termina a fase anular".
  centralEdge: { edge: (central, edge) => `${edge === 'begins' ? 'começa' : 'termina'} a ${central}`, unseen: 'fase central (Sol abaixo do horizonte)' },
  local: {
    eventLabel: { maximum: 'Máximo', sunrise: 'Nascer do Sol', sunset: 'Pôr do Sol' },
    header: (zone) => ['Momento', 'O que acontece', `Local (${zone})`, 'UTC', 'Alt. Sol', 'Az. Sol', 'Sol visível'],
    yes: 'sim',
    no: 'não',
    title: (kind, id, place, coordinates, zone) => `Eclipse ${KIND[kind]} do Sol ${id} visto de ${place} (${coordinates}; ${zone})`,
    seen: {
      total: (m) => `Daqui vê-se um eclipse total (magnitude ${number(m)}).`,
      annular: (m, o) => `Daqui vê-se um eclipse anular (magnitude ${number(m)}; ${o} do disco solar coberto).`,
      partial: (m, o) => `Daqui vê-se um eclipse parcial (magnitude ${number(m)}; ${o} do disco solar coberto no máximo).`,
      partialLow: (o) => `Daqui vê-se um eclipse parcial, com no máximo ${o} do disco solar coberto enquanto o Sol está acima do horizonte (o máximo dá-se com o Sol abaixo do horizonte).`,
      none: 'Daqui não se vê o eclipse.',
    },
    timeNote: (zone) =>
      `Hora local: ${zone}. Horas ao segundo. Altura do Sol: a do seu centro, com refração (Saemundsson) a partir de −1° verdadeiros, geométrica abaixo disso; «visível»: bordo superior acima de um horizonte ao nível do mar.`,
    modelNote: (k1, k2, deltaT, source, predictions) =>
      `Raio da Lua k1 = ${k1} (penumbra: C1, C4, magnitude), k2 = ${k2} (umbra e antumbra: C2, C3); bordo lunar tomado como liso, observador ao nível do mar; ΔT ${deltaT} s (${source}). ${predictions}`,
    safetyHeading: { plain: 'SEGURANÇA OCULAR', markdown: 'Segurança ocular' },
  },
  summary: {
    missed: (place, id) => `De ${place}, a sombra da Lua passa ao lado: a ${id} não se vê nenhum eclipse do Sol.`,
    sunDown: (place, span) => `De ${place}, o Sol está abaixo do horizonte durante todo o eclipse (${span}): não se vê nada.`,
    central: (place, kind, duration, from, to) =>
      `De ${place}, ${kind === 'total' ? 'o Sol fica totalmente eclipsado' : 'a Lua fica inteiramente dentro do disco do Sol, deixando à volta um anel brilhante,'} durante ${duration}, das ${from} às ${to}.`,
    partial: (place, percent) => `De ${place}, o Sol fica parcialmente eclipsado: no máximo, a Lua cobre ${percent} do seu disco.`,
    runs: (span, localDate, stamp, altitude, up) =>
      `Horário do eclipse: ${span}${localDate === undefined ? '' : `, a ${localDate}`}; máximo às ${stamp}, ${up ? `com o Sol a ${altitude}° de altura` : belowHorizon(altitude)}.`,
    risesEclipsed: (stamp) => `O Sol nasce já eclipsado, às ${stamp}.`,
    setsEclipsed: (stamp) => `O Sol põe-se ainda eclipsado, às ${stamp}.`,
    nearEdge: (km) =>
      `Este local fica a menos de ${km} km do limite da faixa: as irregularidades do bordo da Lua e a incerteza de ΔT podem deslocar o limite um quilómetro ou mais, pelo que a fase central pode ser mais curta ou nem chegar a ver-se.`,
    lowSun: (degrees) => `O Sol não passa dos ${degrees}° de altura: é preciso um horizonte baixo e desimpedido nessa direção.`,
  },
  calendar: {
    partialTitle: 'Fases parciais do eclipse do Sol',
    centralTitle: { total: 'Totalidade', annular: 'Fase anular' },
    cutShort: ' (Sol visível)',
    cutLong: ' (a parte com o Sol acima do horizonte)',
    // "Totalidade do eclipse de 2026-08-12", "Fases parciais do eclipse do Sol de 2026-08-12": the eclipse named once.
    description: (title, id, cut) => `${title}${/eclipse/.test(title) ? '' : ' do eclipse'} de ${id}${cut}; são previsões, se o tempo o permitir.`,
    notSeenTitle: (place) => `Eclipse do Sol, não visível de ${place}`,
    notSeenDescription: 'Esta entrada apenas assinala a data; daqui não há nada para ver.',
  },
};

/** O diagrama do Sol e da Lua vistos de um lugar no máximo, e a sua legenda. */
const DIAGRAM: SolarDiagramWords = {
  common: COMMON_PORTUGUESE,
  moments: {
    C1: 'a Lua toca o Sol pela primeira vez',
    C2: 'começa a fase central',
    maximum: 'máxima cobertura do Sol',
    C3: 'termina a fase central',
    C4: 'a Lua deixa o Sol',
    sunrise: 'nascer do Sol',
    sunset: 'pôr do Sol',
  },
  momentLabel: { maximum: 'Máximo', sunrise: 'Nascer do Sol', sunset: 'Pôr do Sol' },
  legend: {
    sun: 'o disco do Sol',
    moonOverSun: 'a Lua diante do Sol',
    moonOutline: 'o contorno da Lua (invisível no céu)',
  },
  compass: { north: 'N', east: 'E' },
  sunAcross: (arcmin) => `diâmetro do Sol: ${arcmin}′`,
  timesHeading: (zone) => `Horas (${zone ?? 'cada uma com o seu fuso'})`,
  sunAltitude: { up: (degrees) => `Sol a ${degrees}°`, down: 'Sol abaixo do horizonte' },
  kind: { total: 'total', annular: 'anular', hybrid: 'híbrido', partial: 'parcial' },
  // "em Oviedo" (shorter than "visto de", so that a square page holds the title whole); "no ponto de máximo".
  title: (date, kind, place) => `${date}: eclipse ${kind} do Sol ${place.startsWith('o ') ? `no ${place.slice(2)}` : `em ${place}`}`,
  percent: (value) => `${value} %`,
  atMaximum: (stamp, sunAltitude, magnitude, obscuration) =>
    `No máximo, às ${stamp}${sunAltitude === undefined ? ' (com o Sol abaixo do horizonte)' : `, com o Sol a ${sunAltitude}° de altura`}: magnitude ${magnitude}, obscurecimento de ${obscuration} do disco solar.`,
  elsewhere: (kind) => `Noutros locais, o eclipse é ${kind}.`,
  smallPrint: {
    drawn: (place) => `O Sol e a Lua vistos ${fromPlace(place)} no máximo, à escala: norte para cima, na direção do polo celeste da data; este à esquerda, como se vê o céu quando se está voltado para ele.`,
    terms: 'Magnitude: a fração do diâmetro do Sol coberta; obscurecimento: a fração do seu disco.',
    times: (zone, deltaT, source) => `Horas em ${zone}, relógio de 24 horas. ΔT ${deltaT} s (${source}).`,
    credits: (font, generator) => `Tipo de letra: ${font}. Feito com ${generator}.`,
  },
  greatestPoint: (where) => `o ponto de máximo (${position(where)})`,
  caption: {
    summary: (time, obscuration, place, magnitude) => `Às ${time}, a Lua cobre ${obscuration} do disco do Sol visto ${fromPlace(place)} (magnitude ${magnitude}).`,
    altText: (place, positionAngle) =>
      `Diagrama do disco do Sol com o disco escuro da Lua à sua frente, à escala, tal como se vê ${fromPlace(place)} no máximo; o centro da Lua está no ângulo de posição ${positionAngle}°, contado do norte para este; norte para cima, este à esquerda, e ao lado a lista das horas do eclipse.`,
    file: (title, summary, caution, altText) => `${title}. ${summary}\n\n${caution}\n\nTexto alternativo: ${altText}\n`,
  },
};

export const SOLAR_PORTUGUESE: SolarWords = {
  body: 'solar',
  common: COMMON_PORTUGUESE,
  text: SOLAR_TEXT_PORTUGUESE,
  figures: FIGURES,
  diagram: DIAGRAM,
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
