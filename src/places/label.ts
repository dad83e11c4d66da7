/** A place as outputs show it: its name, position (degrees, east positive) and IANA time zone. */
export interface PlaceLabel {
  readonly name: string;
  readonly latDeg: number;
  readonly lonDeg: number;
  readonly tz: string;
}
