/** The small figures a map can carry inside its frame (`inset`): kept apart from the drawing so that declaring the option loads no drawing code. */
export type MapInset = 'none' | 'diagram';
export const MAP_INSETS: readonly MapInset[] = ['none', 'diagram'];
