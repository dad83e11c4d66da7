/**
 * La advertencia de seguridad ocular de los eclipses de Sol, en español, con
 * todo el contenido de la inglesa (caution.ts): filtros ISO 12312-2 o
 * proyección; nunca una fase parcial o anular sin protección; la totalidad,
 * solo dentro de la franja; instrumentos con filtro frontal; niños
 * acompañados; las autoridades sanitarias locales.
 */
import { COMMON_SPANISH } from '../common/es.ts';
import type { SolarWords } from './caution.ts';

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
