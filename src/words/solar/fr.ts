/**
 * La mise en garde pour les yeux lors des éclipses de Soleil, en français, avec
 * tout le contenu de l’anglaise (caution.ts) : filtres ISO 12312-2 ou
 * projection ; jamais une phase partielle ou annulaire sans protection ; la
 * totalité, seulement dans la bande ; instruments munis d’un filtre à l’avant ;
 * enfants accompagnés ; autorités sanitaires locales.
 */
import { COMMON_FRENCH } from '../common/fr.ts';
import type { SolarWords } from './caution.ts';

const NBSP = '\u00a0';

export const SOLAR_FRENCH: SolarWords = {
  body: 'solar',
  common: COMMON_FRENCH,
  caution: {
    long: {
      viewers: 'Ne regardez le Soleil qu’à travers des lunettes d’éclipse ou des visionneuses conformes à la norme ISO 12312-2, ou observez son image projetée sur un carton.',
      neverUnprotected: `Ne regardez jamais une phase partielle ou annulaire sans protection, quelle que soit la part du Soleil cachée${NBSP}: même un mince croissant peut blesser l’œil.`,
      totality: `Seulement dans la bande de totalité, et seulement pendant que la Lune cache entièrement le Soleil, on peut ôter ses lunettes${NBSP}; remettez-les dès le retour de la première lumière vive.`,
      noTotality: 'Hors de la bande de totalité, il n’est à aucun moment sans danger de regarder sans filtre.',
      optics: `Jumelles, télescopes et appareils photo doivent être munis d’un filtre solaire adapté, fixé à l’avant de l’instrument${NBSP}; ne regardez jamais à travers eux avec de simples lunettes d’éclipse.`,
      children: 'Les enfants ne doivent observer qu’accompagnés d’un adulte.',
      authorities: 'Suivez les conseils des autorités sanitaires locales.',
    },
    short: {
      viewers: `Protégez vos yeux${NBSP}: observez uniquement avec des lunettes d’éclipse ISO 12312-2 ou par projection${NBSP}; ne regardez jamais une phase partielle ou annulaire sans protection, quelle que soit la part du Soleil cachée.`,
      totality: 'Lunettes ôtées seulement pendant que la totalité cache entièrement le Soleil, remises dès la première lumière vive.',
      noTotality: 'Hors de la bande de totalité, il n’est à aucun moment sans danger de regarder sans filtre.',
      both: `Dans la bande, lunettes ôtées seulement pendant que la totalité cache entièrement le Soleil, remises dès la première lumière vive${NBSP}; hors de la bande, il n’est à aucun moment sans danger de regarder sans filtre.`,
      rest: `Pas de jumelles, de télescope ni d’appareil photo sans filtre solaire à l’avant. Enfants accompagnés${NBSP}; suivez les conseils sanitaires locaux.`,
    },
  },
};
