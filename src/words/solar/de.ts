/**
 * Der Augenschutz-Hinweis für Sonnenfinsternisse auf Deutsch, mit dem ganzen
 * Inhalt des englischen (caution.ts): Filter nach ISO 12312-2 oder Projektion;
 * nie eine partielle oder ringförmige Phase ohne Schutz; die Totalität nur in
 * der Totalitätszone; Instrumente mit Frontfilter; Kinder nur mit
 * Erwachsenen; die örtlichen Gesundheitsbehörden.
 */
import { COMMON_GERMAN } from '../common/de.ts';
import type { SolarWords } from './caution.ts';

export const SOLAR_GERMAN: SolarWords = {
  body: 'solar',
  common: COMMON_GERMAN,
  caution: {
    long: {
      viewers: 'Blicken Sie nur durch Finsternisbrillen oder Handsichtgeräte, die der Norm ISO 12312-2 entsprechen, in die Sonne, oder betrachten Sie ihr auf einen Karton projiziertes Bild.',
      neverUnprotected: 'Blicken Sie nie ohne Schutz auf eine partielle oder ringförmige Phase, ganz gleich, wie viel der Sonne bedeckt ist: Schon eine schmale Sichel kann das Auge verletzen.',
      totality: 'Nur in der Totalitätszone und nur solange der Mond die Sonne vollständig verdeckt, darf der Schutz abgenommen werden; setzen Sie ihn beim ersten hellen Licht sofort wieder auf.',
      noTotality: 'Außerhalb der Totalitätszone ist es zu keinem Zeitpunkt sicher, ohne Filter hinzusehen.',
      optics: 'Ferngläser, Teleskope und Kameras brauchen einen geeigneten Sonnenfilter vor der Öffnung des Instruments; schauen Sie nie allein mit einer Finsternisbrille hindurch.',
      children: 'Kinder sollten nur in Begleitung eines Erwachsenen beobachten.',
      authorities: 'Folgen Sie den Empfehlungen Ihrer örtlichen Gesundheitsbehörden.',
    },
    short: {
      viewers: 'Augenschutz: nur durch Finsternisbrillen nach ISO 12312-2 oder per Projektion beobachten; nie ohne Schutz auf eine partielle oder ringförmige Phase blicken, ganz gleich, wie viel der Sonne bedeckt ist.',
      totality: 'Schutz nur ab, solange die Totalität die Sonne vollständig verdeckt, beim ersten hellen Licht wieder auf.',
      noTotality: 'Außerhalb der Totalitätszone ist es zu keinem Zeitpunkt sicher, ohne Filter hinzusehen.',
      both: 'In der Totalitätszone Schutz nur ab, solange die Totalität die Sonne vollständig verdeckt, beim ersten hellen Licht wieder auf; außerhalb ist es zu keinem Zeitpunkt sicher, ohne Filter hinzusehen.',
      rest: 'Keine Ferngläser, Teleskope oder Kameras ohne Sonnenfilter vor dem Objektiv. Kinder beaufsichtigen; örtliche Gesundheitshinweise beachten.',
    },
  },
};
