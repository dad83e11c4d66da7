/**
 * O aviso de segurança ocular dos eclipses do Sol, em português, com todo o
 * conteúdo do inglês (caution.ts): filtros ISO 12312-2 ou projeção; nunca uma
 * fase parcial ou anular sem proteção; a totalidade, só dentro da faixa;
 * instrumentos com filtro frontal; crianças acompanhadas; as autoridades de
 * saúde locais.
 */
import { COMMON_PORTUGUESE } from '../common/pt.ts';
import type { SolarWords } from './caution.ts';

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
