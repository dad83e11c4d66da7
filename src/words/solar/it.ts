/**
 * L’avvertenza per la sicurezza degli occhi durante le eclissi di Sole, in
 * italiano, con tutto il contenuto di quella inglese (caution.ts): filtri ISO
 * 12312-2 o proiezione; mai una fase parziale o anulare senza protezione; la
 * totalità, solo nella fascia; strumenti con filtro anteriore; bambini
 * accompagnati; le autorità sanitarie locali.
 */
import { COMMON_ITALIAN } from '../common/it.ts';
import type { SolarWords } from './caution.ts';

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
