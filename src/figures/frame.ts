/**
 * The page every figure sits on: paper, a header band (title, wrapped
 * subtitle), a footer (legend rows, wrapped small print), margins, all in
 * page units (`layoutFor`). A figure body — a map, a sky plot, a diagram —
 * takes the room between header and footer and supplies its own layers; the
 * frame draws the rest. One frame serves every figure, so that they read as
 * one family and a new figure only writes its body and its legend entries.
 */
import { flowRows, layoutFor, textElement, type Layout, type PageSize } from './draw.ts';
import type { Theme } from './theme.ts';
import { escapeXml, fitText, measureText, wrapText, type TextStyle } from './typography.ts';

/** A legend entry: a swatch drawn by the layer it explains (same stroke and fill specs), and its words. */
export interface LegendEntry {
  readonly label: string;
  /** The swatch in a `sizePx` square whose top-left corner is (x, y). */
  readonly swatch: (x: number, y: number, sizePx: number) => string;
}

/** How a figure's legend is set: swatch size and the gap after each entry, in page units. */
export interface LegendSetting {
  readonly swatchUnits: number;
  readonly gapUnits: number;
  /**
   * Whether the gap counts in an entry's width when a row is filled (a row
   * then ends one gap earlier); the maps do not, the sky figure does.
   */
  readonly gapInWidth: boolean;
}

export interface PageSpec {
  readonly size: PageSize;
  readonly theme: Theme;
  /** The prefix of the SVG's title and description ids ("map" → map-title, map-desc). */
  readonly id: string;
  readonly title: string;
  readonly subtitle: string;
  /**
   * A notice printed in the header band under the subtitle, in full ink (a
   * solar map's eye-safety caution): part of the band, so that no custom
   * title or trimmed footer can drop it.
   */
  readonly notice?: string;
  /** The SVG's description, for screen readers. */
  readonly description: string;
  readonly smallPrint: string;
  readonly legend: readonly LegendEntry[];
  readonly legendSetting: LegendSetting;
  /** Room under the subtitle, in page units. */
  readonly headerGapUnits: number;
}

/** Where the footer goes: right under the body (`top`, page px), or at the foot of the page. */
export type FooterPlace = { readonly top: number } | 'page-bottom';

export interface PageFrame {
  readonly layout: Layout;
  readonly contentWidth: number;
  /** The header band's lower edge: a body starts here. */
  readonly headerBottom: number;
  /** The footer's height (legend rows, a gap, small print): a body ends above it. */
  readonly footerHeight: number;
  /** The notice's lines in the header band, with their baselines (before any header shift) and type. */
  readonly noticeLines: readonly { readonly text: string; readonly baselinePx: number }[];
  readonly noticeStyle: TextStyle;
  /**
   * The whole page as SVG: the body's `defs` and layers between the paper
   * and the header; `headerShiftPx` moves the header down (a map shorter
   * than its room pulls header and footer in around it).
   */
  render(body: { readonly defs?: string; readonly layers: readonly string[]; readonly headerShiftPx?: number; readonly footer: FooterPlace }): string;
}

export function pageFrame(spec: PageSpec): PageFrame {
  const { size, theme } = spec;
  const layout = layoutFor(size);
  const { unit, margin } = layout;
  const W = size.widthPx;
  const H = size.heightPx;
  const contentWidth = W - 2 * margin;

  const titleText = fitText(spec.title, layout.titleStyle, contentWidth);
  const subtitleLines = wrapText(spec.subtitle, layout.subtitleStyle, contentWidth);
  const titleBaseline = margin + layout.titleStyle.sizePx * 0.95;
  const subtitleBaseline = titleBaseline + layout.subtitleStyle.sizePx * 1.65;
  const noticeStyle: TextStyle = { ...layout.subtitleStyle, weight: 'semibold' };
  const noticeLines = spec.notice === undefined ? [] : wrapText(spec.notice, noticeStyle, contentWidth);
  const noticeBaseline = subtitleBaseline + (subtitleLines.length - 1) * layout.subtitleStyle.sizePx * 1.35 + noticeStyle.sizePx * 1.55;
  const headerBottom = noticeLines.length === 0
    ? subtitleBaseline + (subtitleLines.length - 1) * layout.subtitleStyle.sizePx * 1.35 + spec.headerGapUnits * unit
    : noticeBaseline + (noticeLines.length - 1) * noticeStyle.sizePx * 1.35 + spec.headerGapUnits * unit;

  const { swatchUnits, gapUnits, gapInWidth } = spec.legendSetting;
  const swatch = swatchUnits * unit;
  const legendRowHeight = layout.legendStyle.sizePx * 1.7;
  const entryWidth = (entry: LegendEntry) => swatch + 6 * unit + measureText(entry.label, layout.legendStyle);
  const legendRows = gapInWidth
    ? flowRows(spec.legend, (entry) => entryWidth(entry) + gapUnits * unit, contentWidth, margin)
    : flowRows(spec.legend, entryWidth, contentWidth, margin, gapUnits * unit);
  const smallLines = wrapText(spec.smallPrint, layout.smallStyle, contentWidth);
  const smallHeight = smallLines.length * layout.smallStyle.sizePx * 1.4;
  const footerHeight = legendRows.length * legendRowHeight + 10 * unit + smallHeight;

  return {
    layout,
    contentWidth,
    headerBottom,
    footerHeight,
    noticeLines: noticeLines.map((text, i) => ({ text, baselinePx: noticeBaseline + i * noticeStyle.sizePx * 1.35 })),
    noticeStyle,
    render({ defs, layers, headerShiftPx = 0, footer }) {
      const out: string[] = [
        `<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}" viewBox="0 0 ${W} ${H}" role="img" aria-labelledby="${spec.id}-title ${spec.id}-desc">`,
        `<title id="${spec.id}-title">${escapeXml(spec.title)}</title>`,
        `<desc id="${spec.id}-desc">${escapeXml(spec.description)}</desc>`,
      ];
      if (defs) out.push(defs);
      out.push(`<rect width="${W}" height="${H}" fill="${theme.paper}"/>`);
      out.push(...layers);

      // Header.
      out.push(textElement(titleText, margin, titleBaseline + headerShiftPx, layout.titleStyle, theme.text));
      subtitleLines.forEach((line, i) => {
        out.push(textElement(line, margin, subtitleBaseline + headerShiftPx + i * layout.subtitleStyle.sizePx * 1.35, layout.subtitleStyle, theme.textMuted));
      });
      noticeLines.forEach((line, i) => {
        out.push(textElement(line, margin, noticeBaseline + i * noticeStyle.sizePx * 1.35 + headerShiftPx, noticeStyle, theme.text));
      });

      // Legend, then small print.
      const legendTop = footer === 'page-bottom' ? H - margin - footerHeight : footer.top;
      legendRows.forEach((row, r) => {
        const y = legendTop + r * legendRowHeight;
        for (const entry of row) {
          out.push(entry.swatch(entry.x, y, swatch));
          out.push(textElement(entry.label, entry.x + swatch + 6 * unit, y + swatch * 0.8, layout.legendStyle, theme.text));
        }
      });
      smallLines.forEach((line, i) => {
        // (Each sum in this order: a reordered sum may differ in its last bit, and then in the page's bytes.)
        const y = footer === 'page-bottom'
          ? H - margin - smallHeight + layout.smallStyle.sizePx * (1 + i * 1.4) - layout.smallStyle.sizePx * 0.4
          : footer.top + legendRows.length * legendRowHeight + 10 * unit + layout.smallStyle.sizePx * (1 + i * 1.4) - layout.smallStyle.sizePx * 0.4;
        out.push(textElement(line, margin, y, layout.smallStyle, theme.textMuted));
      });
      out.push('</svg>');
      return out.join('\n');
    },
  };
}
