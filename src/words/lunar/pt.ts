/**
 * Os eclipses da Lua em português: a tabela, o horário local, o calendário, o
 * resumo, a legenda e o texto alternativo, a folha de contactos e as palavras
 * das figuras. Reviewed wording; the trade's contact names (P1…U4), Danjon,
 * Chauvenet, ΔT and saros stay as astronomers write them.
 */
import { COMMON_PORTUGUESE } from '../common/pt.ts';
import { meantOnlyFor } from '../common.ts';
import type { LunarDiagramWords } from './diagram.ts';
import type { LunarFigureWords } from './figures.ts';
import type { LunarWords } from './text.ts';

// The plural rules of the Portuguese this catalogue is written in ("0 eclipses"; CLDR's bare "pt" counts 0 as singular).
const plural = new Intl.PluralRules('pt-PT');
const counted = (count: number, one: string, other: string) => `${count} ${plural.select(count) === 'one' ? one : other}`;

const FIGURES: LunarFigureWords = {
  common: COMMON_PORTUGUESE,
  nakedEye: meantOnlyFor('lunar', 'Um eclipse da Lua pode ser observado sem perigo a olho nu.'),
  kindTitle: { total: 'Eclipse total da Lua', partial: 'Eclipse parcial da Lua', penumbral: 'Eclipse penumbral da Lua' },
  map: {
    title: (kindTitle, date) => `${kindTitle} · ${date}`,
    greatest: (stamp) => `Máximo ${stamp}`,
    penumbralMagnitude: (value) => `magnitude penumbral ${value}`,
    penumbralPhase: (duration, span) => `fase penumbral ${duration} (${span})`,
    umbralMagnitude: (value) => `magnitude umbral ${value}`,
    totality: (duration, span) => `totalidade ${duration} (${span})`,
    inUmbra: (duration, span) => `na umbra ${duration} (${span})`,
    timesIn: (zone) => `Horas em ${zone}, relógio de 24 horas, arredondadas ao minuto; «+1 dia»: o dia seguinte à data do título.`,
    shadow: (convention, deltaT) => `Sombra: convenção de ${convention}; ΔT ${deltaT}.`,
    moonUp: 'Lua acima do horizonte: bordo superior acima de um horizonte ao nível do mar, com refração padrão.',
    credits: (basemap, font, generator) => `${basemap}. Tipo de letra: ${font}. Feito com ${generator}.`,
  },
  legend: {
    zonesOf: { penumbral: 'o eclipse', umbral: 'a fase umbral' },
    codesP: 'P1/P4 a Lua entra na sombra exterior (penumbra) / sai dela',
    codesU: 'U1/U4 a umbra',
    codesTotality: 'U2/U3 início/fim da totalidade',
    // `phase` carries its article ("o eclipse", "a fase umbral"): "d" + it reads "do eclipse", "da fase umbral".
    zoneAll: (phase) => `Lua acima do horizonte do princípio ao fim d${phase}`,
    zoneSets: (phase) => `A Lua põe-se durante ${phase}`,
    zoneRises: (phase) => `A Lua nasce durante ${phase}`,
    zoneNone: 'Lua abaixo do horizonte o tempo todo',
    boundaryStrong: (phase) => `Nascer/ocaso da Lua no início e no fim d${phase}`,
    boundaryLight: 'noutras fases',
    countedPhase: { totality: 'totalidade', umbral: 'fase umbral', penumbral: 'fase penumbral' },
    field: (phase) => `minutos de ${phase} com a Lua acima do horizonte`,
    centre: 'Lua no zénite no máximo',
    townOwnClock: 'localidade marcada: a fase principal na sua hora local',
    town: 'localidade marcada: a fase principal',
    codes: (codes) => `pequenas etiquetas nas linhas: ${codes}`,
  },
  mark: { greatest: 'máximo', rises: 'nasce', sets: 'põe-se', notSeen: 'não visível' },
  stage: {
    P1: 'no início da ténue sombra exterior',
    P1Penumbral: 'no início do eclipse',
    U1: 'no início do eclipse parcial',
    U2: 'no início da totalidade',
    greatest: 'no máximo',
    U3: 'no fim da totalidade',
    U4: 'no fim do eclipse parcial',
    P4: 'no fim da ténue sombra exterior',
    P4Penumbral: 'no fim do eclipse',
  },
  boundaryLabel: (rising, stage, time) => `A Lua ${rising ? 'nasce' : 'põe-se'} ${stage} · ${time}`,
  sky: {
    classes: { day: 'dia', civil: 'crepúsculo civil', nautical: 'crepúsculo náutico', astronomical: 'crepúsculo astronómico', night: 'noite' },
    phases: { penumbral: 'fase penumbral', partial: 'fase parcial', total: 'totalidade' },
    horizon: 'horizonte',
    kinds: { total: 'total', partial: 'parcial', penumbral: 'penumbral' },
    eventName: { greatest: 'Máximo', moonrise: 'Nascer da Lua', moonset: 'Ocaso da Lua' },
    title: (kind, place, date) => `O eclipse ${kind} da Lua visto de ${place} · ${date}`,
    localTime: (zone) =>
      `Hora local: ${zone}, relógio de 24 horas. Altura do centro da Lua com refração padrão, acima de um horizonte ao nível do mar; letras sob a trajetória: para onde olhar (ponto cardeal, p. ex. ESE = és-sueste).`,
    shadow: (convention, deltaT, source) => `Sombra: convenção de ${convention}; ΔT ${deltaT.toFixed(1)} s (${source}).`,
    credits: (places, font, generator) => `${places} Tipo de letra: ${font}. Feito com ${generator}.`,
    altText: (place) =>
      `Gráfico da altura da Lua acima do horizonte ao longo da noite em ${place}, com a hora local em baixo, as fases do eclipse marcadas na sua trajetória e o crepúsculo ao fundo.`,
    file: (title, summary, alt) => `${title}. ${summary}\n\nTexto alternativo: ${alt}\n`,
  },
};

/** O diagrama da Lua através da sombra da Terra, a sua legenda e o título da inserção no mapa. */
const DIAGRAM: LunarDiagramWords = {
  common: COMMON_PORTUGUESE,
  moments: {
    P1: 'toca a penumbra',
    U1: 'toca a umbra',
    U2: 'toda dentro da umbra',
    greatest: 'no ponto mais fundo da sombra',
    U3: 'começa a sair da umbra',
    U4: 'fora da umbra',
    P4: 'fora da penumbra',
  },
  legend: {
    penumbra: 'penumbra: parte do Sol oculta',
    umbra: 'umbra: todo o Sol oculto',
    moonAtGreatest: 'a Lua no máximo',
    moonAtContact: 'a Lua em cada contacto',
    path: 'o percurso da Lua; a seta: o sentido do movimento',
  },
  compass: { north: 'N', east: 'E' },
  greatest: 'Máximo',
  moonAcross: (arcmin) => `diâmetro da Lua: ${arcmin}′`,
  timesHeading: (zone) => `Horas (${zone ?? 'cada uma com o seu fuso'})`,
  kindTitle: { total: 'total', partial: 'parcial', penumbral: 'penumbral' },
  title: (kindTitle, date) => `Eclipse ${kindTitle} da Lua de ${date}: através da sombra da Terra`,
  shortTitle: (kindTitle, date) => `Eclipse ${kindTitle} da Lua de ${date}`,
  depth: { penumbral: (m) => `magnitude penumbral ${m}`, umbral: (m) => `magnitude umbral ${m}` },
  longest: { totality: (d) => `totalidade ${d}`, partial: (d) => `fase parcial ${d}`, penumbral: (d) => `fase penumbral ${d}` },
  subtitle: (time, depth, longest, zone) => `O percurso da Lua através da sombra, com o máximo às ${time} (${depth}, ${longest}). Horas: ${zone}.`,
  smallPrint: {
    frame: 'Visto do centro da Terra, com a sombra parada: a linha é o percurso calculado da Lua em relação a ela.',
    orientation: 'Norte para cima, na direção do polo celeste da data; este à esquerda, como se vê o céu quando se está voltado para ele.',
    shadow: (convention, deltaT, source, gamma) => `Sombra: convenção de ${convention}, círculos no máximo; ΔT ${deltaT} s (${source}); gama ${gamma}.`,
    credits: (font, generator) => `Tipo de letra: ${font}. Feito com ${generator}.`,
  },
  nakedEye: meantOnlyFor('lunar', 'Um eclipse da Lua pode ser observado sem perigo a olho nu.'),
  caption: {
    wholly: (from, to) => ` Está toda dentro da umbra das ${from} às ${to}.`,
    partly: (from, to) => ` Está em parte dentro da umbra das ${from} às ${to}.`,
    never: ' Nunca chega à umbra.',
    summary: (p1, greatest, p4, inner) => `A Lua entra na penumbra da Terra às ${p1}, chega ao ponto mais fundo da sombra às ${greatest} e sai dela às ${p4}.${inner}`,
    altText: (side) =>
      `Diagrama de dois círculos concêntricos, a penumbra da Terra, mais clara, à volta da umbra, mais escura, atravessados da direita para a esquerda pelo percurso da Lua, que passa a ${side === 'north' ? 'norte' : 'sul'} do centro; a Lua aparece desenhada onde cada fase começa e acaba e no máximo, cada uma com a sua hora. Norte para cima, este à esquerda.`,
    file: (title, summary, altText) => `${title}. ${summary}\n\nTexto alternativo: ${altText}\n`,
  },
  inset: { heading: 'Através da sombra · N em cima, E à esquerda' },
};

export const LUNAR_PORTUGUESE: LunarWords = {
  body: 'lunar',
  common: COMMON_PORTUGUESE,
  figures: FIGURES,
  diagram: DIAGRAM,
  kindTitle: { total: 'total', partial: 'parcial', penumbral: 'penumbral' },
  kind: { total: 'total', partial: 'parcial', penumbral: 'penumbral' },
  convention: { danjon: 'Danjon', chauvenet: 'Chauvenet' },
  nakedEyeInCalendar: meantOnlyFor('lunar', 'Pode ser observado sem perigo a olho nu; são previsões, se o tempo o permitir.'),
  table: {
    kind: { total: 'total', partial: 'parcial', penumbral: 'penumbral' },
    catalogueHeader: ['Data', 'Tipo', 'Máximo (UTC)', 'Mag. umbral', 'Mag. penumbral', 'Gama', 'Na umbra', 'Totalidade', 'Saros'],
    absent: '–',
    julianBeside: (isoDate, julianDate) => `${isoDate} (juliano: ${julianDate})`,
    eclipses: (count) => counted(count, 'eclipse da Lua', 'eclipses da Lua'),
    catalogueTitle: (counted, from, to) => `${counted} de ${from} até ${to} (exclusive)`,
    catalogueTimes: (convention, julianNote) => `Horas em UTC, arredondadas ao minuto. Sombra: convenção de ${convention}.${julianNote}`,
    catalogueJulian: ' Datas: calendário gregoriano proléptico; antes de 15 de outubro de 1582 segue-se a data juliana.',
    deltaTSpan: ([least, most]) => (least === most ? `${least.toFixed(1)} s` : `${least.toFixed(1)}–${most.toFixed(1)} s`),
    deltaTNote: (span, sources, model) => `ΔT ${span} (${sources}; modelo: ${model}).`,
    deltaTModelOnly: (model) => `Modelo de ΔT: ${model}.`,
  },
  local: {
    events: {
      P1: 'a Lua entra na penumbra',
      U1: 'começa o eclipse parcial',
      U2: 'começa a totalidade',
      greatest: 'máximo do eclipse',
      U3: 'termina a totalidade',
      U4: 'termina o eclipse parcial',
      P4: 'a Lua sai da penumbra',
      moonrise: 'nascer da Lua',
      moonset: 'ocaso da Lua',
    },
    eventLabel: { greatest: 'Máximo', moonrise: 'Nascer', moonset: 'Ocaso' },
    header: (zone) => ['Momento', 'O que acontece', `Local (${zone})`, 'UTC', 'Alt. Lua', 'Az. Lua', 'Lua visível', 'Alt. Sol', 'Céu'],
    yes: 'sim',
    no: 'não',
    sky: { day: 'dia', civil: 'civil', nautical: 'náutico', astronomical: 'astronómico', night: 'noite' },
    title: (kindTitle, id, julianDate, place, coordinates, zone) =>
      `Eclipse ${kindTitle} da Lua ${id}${julianDate ? ` (juliano: ${julianDate})` : ''} visto de ${place} (${coordinates}; ${zone})`,
    timeNote: (zone, julianNote) =>
      `Hora local: ${zone}. Horas arredondadas ao minuto. Altura da Lua: a do seu centro, com refração a partir de −1° verdadeiros, geométrica abaixo disso; «visível»: bordo superior acima de um horizonte ao nível do mar.${julianNote}`,
    julianNote: ' Datas: calendário gregoriano proléptico (a data juliana aparece ao lado da data do eclipse).',
    shadowNote: (convention, deltaT, source, predictions) => `Sombra: convenção de ${convention}; ΔT ${deltaT.toFixed(1)} s (${source}). ${predictions}`,
  },
  calendar: {
    phaseTitle: { penumbral: 'Eclipse penumbral da Lua', partial: 'Fases parciais do eclipse da Lua', total: 'Totalidade' },
    cutToMoonUp: ' (a parte com a Lua acima do horizonte)',
    cutToMoonUpShort: ' (Lua visível)',
    description: (title, id, cut, summary, nakedEye) => `${title} de ${id}${cut}. ${summary} ${nakedEye}`,
    notSeenTitle: (place) => `Eclipse da Lua, não visível de ${place}`,
    notSeenDescription: (summary) => `${summary} Esta entrada apenas assinala a data; daqui não há nada para ver.`,
  },
  summary: {
    compass: ['norte', 'nordeste', 'este', 'sudeste', 'sul', 'sudoeste', 'oeste', 'noroeste'],
    position: (altitudeDeg, direction) => `${altitudeDeg < 15 ? 'baixa a' : altitudeDeg < 45 ? 'a' : 'alta a'} ${direction}`,
    aboveHorizon: (degrees) => `a ${degrees}° acima do horizonte`,
    phaseState: {
      before: 'antes de o eclipse começar',
      penumbral: 'na ténue fase penumbral',
      partial: 'parcialmente eclipsada',
      total: 'totalmente eclipsada',
      after: 'depois de o eclipse terminar',
    },
    contacts: { U1: 'começa a fase parcial', U2: 'começa a totalidade', U3: 'termina a totalidade', U4: 'termina a fase parcial' },
    penumbralContacts: { P1: 'começa a fase penumbral', P4: 'termina a fase penumbral' },
    from: (place) => `De ${place}`,
    notSeen: 'o eclipse não pode ser visto: a Lua está abaixo do horizonte do princípio ao fim.',
    daylight: ' Uma parte ocorre de dia, quando a Lua é difícil de ver.',
    rises: 'nasce',
    risesAgain: 'volta a nascer',
    sets: 'põe-se',
    moves: (verb, time, direction, state) => `a Lua ${verb} às ${time}${direction === undefined ? '' : ` a ${direction}`}, ${state}`,
    mainSpan: (penumbral, span, totality, where) =>
      `${penumbral ? 'fase penumbral' : 'fases parciais'} ${span}${totality === undefined ? '' : `, totalidade ${totality}`}, com a Lua ${where} no máximo`,
    greatestAt: (time, where) => `máximo do eclipse às ${time}, com a Lua ${where}`,
    contactAt: (contact, time) => `${contact} às ${time}`,
    inView: {
      wholePenumbral: 'vê-se todo o eclipse penumbral',
      whole: 'vê-se todo o eclipse',
      partPenumbral: 'vê-se parte do eclipse penumbral',
      allPartialAndTotality: 'veem-se todas as fases parciais e a totalidade',
      allPartial: 'vê-se toda a fase parcial',
      onlyPenumbral: 'só se vê a ténue fase penumbral',
      partPartial: 'vê-se parte da fase parcial',
      allTotalityPartPartial: 'vê-se toda a totalidade e parte das fases parciais',
      partTotality: 'vê-se parte da totalidade',
      partPartialNoTotality: 'vê-se parte da fase parcial, mas não a totalidade',
    },
  },
  caption: {
    title: (kindTitle, date) => `Eclipse ${kindTitle} da Lua de ${date}.`,
    penumbralFacts: (stamp, magnitude, duration, span) =>
      `Máximo do eclipse às ${stamp}, magnitude penumbral ${magnitude}; a Lua passa ${duration} na penumbra (${span}), um escurecimento subtil.`,
    umbralFacts: (stamp, magnitude, totality, duration, span) =>
      `Máximo do eclipse às ${stamp}, magnitude umbral ${magnitude}${totality ? `; a totalidade dura ${totality.duration} (${totality.span})` : ''}; a Lua passa ${duration} na umbra (${span}).`,
    zone: {
      'sees-all': 'Visível do princípio ao fim:',
      'sets-during': 'A Lua põe-se durante o eclipse:',
      'rises-during': 'A Lua nasce durante o eclipse:',
    },
    zoneInAltText: {
      'sees-all': 'visível do princípio ao fim:',
      'sets-during': 'a Lua põe-se durante o eclipse:',
      'rises-during': 'a Lua nasce durante o eclipse:',
    },
    continent: (name, share) => (share === 'whole' ? name : share === 'most' ? `grande parte da ${name}` : `partes da ${name}`),
    somewhere: 'partes do mundo',
    including: (names) => ` (incluindo ${names})`,
    hidden: (where) => `Não visível: ${where}.`,
    altText: (kind, date, parts, hidden) => `Mapa do mundo que mostra onde se pode ver o eclipse ${kind} da Lua de ${date} – ${parts}${hidden === undefined ? '' : `; não visível: ${hidden}`}.`,
    file: (caption, altText) => `${caption}\n\nTexto alternativo: ${altText}\n`,
  },
  sheet: {
    title: (from, last) => `Eclipses da Lua de ${from} a ${last}`,
    roles: { map: 'mapa', caption: 'legenda', thumbnail: 'miniatura', local: 'tabela local', sky: 'vista daqui', diagram: 'diagrama' },
    fileNote: (role, kib) => `${role}, ${kib} KiB`,
    greatestUtc: (hhmm) => `Máximo ${hhmm} UTC`,
    greatestLocal: (stamp) => `Máximo ${stamp}`,
    penumbralMagnitude: (value) => `magnitude penumbral ${value}`,
    umbralMagnitude: (value) => `magnitude umbral ${value}`,
    totality: (duration) => `totalidade ${duration}`,
    inUmbra: (duration) => `na umbra ${duration}`,
    penumbralPhase: (duration) => `fase penumbral ${duration}`,
    saros: (n) => `saros ${n}`,
    // On a sheet holding both kinds the card's kind already says "da Lua" (the solar words' lunarKind): said once.
    thumbnailAlt: (kind, date) => `Mapa de visibilidade do eclipse ${kind.replace(/ da Lua$/, '')} da Lua de ${date}`,
    eclipses: (count) => counted(count, 'eclipse', 'eclipses'),
    header: (counted, zone, styleHash, tool) => `${counted} · datas e horas em ${zone} · estilo ${styleHash} · ${tool}`,
    credits: 'Mapa de base: Natural Earth via world-atlas (domínio público). Locais: GeoNames (CC BY 4.0). Ver manifest.json e catalogue.csv.',
  },
};
