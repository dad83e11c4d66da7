/**
 * A figure with a timetable beside it (wide pages) or below it: the column widths of the rows, and where
 * the plot and the table go. The lunar shadow diagram and the solar view at maximum both lay out so.
 */
import { measureText, type TextStyle } from './typography.ts';

export interface TimetableRowText {
  readonly label: string;
  readonly time: string;
  readonly words: string;
}

export interface TimetablePage {
  readonly W: number;
  readonly H: number;
  readonly margin: number;
  readonly unit: number;
  readonly contentWidth: number;
  readonly headerBottom: number;
  readonly footerHeight: number;
}

/** `sideShare`: the most of the content width a timetable beside the plot may take. */
export function timetableLayout(rows: readonly TimetableRowText[], rowStyle: TextStyle, headStyle: TextStyle, page: TimetablePage, sideShare: number) {
  const { W, H, margin, unit, contentWidth } = page;
  const keyWidth = Math.max(...rows.map((r) => measureText(r.label, { ...rowStyle, weight: 'semibold' })));
  const timeWidth = Math.max(...rows.map((r) => measureText(r.time, rowStyle)));
  const wordsWidth = Math.max(...rows.map((r) => measureText(r.words, rowStyle)));
  const gap = 10 * unit;
  const tableWidth = keyWidth + timeWidth + wordsWidth + 2 * gap;
  const rowHeight = rowStyle.sizePx * 1.75;
  const tableHeight = headStyle.sizePx * 2 + rows.length * rowHeight;

  const bodyTop = page.headerBottom;
  const bodyBottom = H - margin - page.footerHeight - 10 * unit;
  // Wide pages put the timetable beside the figure; others put it below it.
  const side = W / H >= 1.2 && tableWidth < contentWidth * sideShare;
  const plot = side
    ? { left: margin, top: bodyTop, right: W - margin - tableWidth - 24 * unit, bottom: bodyBottom }
    : { left: margin, top: bodyTop, right: W - margin, bottom: bodyBottom - tableHeight - 12 * unit };
  const table = side
    ? { left: W - margin - tableWidth, top: bodyTop + 8 * unit }
    : { left: margin + Math.max(0, (contentWidth - tableWidth) / 2), top: plot.bottom + 12 * unit };
  return { keyWidth, timeWidth, wordsWidth, gap, tableWidth, rowHeight, tableHeight, bodyTop, bodyBottom, side, plot, table };
}
