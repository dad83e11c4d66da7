/**
 * The page frame serves any figure body, and a layer and its legend entry
 * are inked from one spec. The accessible-name pattern checked here
 * (role="img", aria-labelledby naming the <title> and <desc> ids) is the one
 * the W3C's SVG Accessibility API Mappings describe for a graphic with a
 * title and a description.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { pageFrame, type LegendEntry } from '../../src/figures/frame.ts';
import { boundaryLight, boundaryStrong, fieldStroke, lineSwatch, strokeAttributes, strokedPath } from '../../src/figures/layers.ts';
import { THEMES } from '../../src/figures/theme.ts';
import { render } from './support.ts';

const theme = THEMES.print;
const size = { widthPx: 1200, heightPx: 675 };
const entry = (label: string): LegendEntry => ({ label, swatch: (x, y, s) => `<rect class="swatch" x="${x}" y="${y}" width="${s}" height="${s}"/>` });

test('a body that is no map (a stand-in diagram) gets the header, legend and small print around it', () => {
  const page = pageFrame({
    size, theme, id: 'diagram', title: 'Night Notes & the Kestrel Ridge <diagram>', subtitle: 'A body drawn by its own code', description: 'Kestrel Ridge "test"',
    smallPrint: 'Small print.', legend: [entry('first'), entry('second')], legendSetting: { swatchUnits: 15, gapUnits: 16, gapInWidth: false }, headerGapUnits: 14,
  });
  const body = `<rect id="body" x="0" y="${page.headerBottom}" width="10" height="10"/>`;
  const svg = page.render({ layers: [body], footer: 'page-bottom' });
  const lines = svg.split('\n');
  assert.match(lines[0]!, /role="img" aria-labelledby="diagram-title diagram-desc"/);
  // Title and description escaped for XML (W3C XML 1.0, section 2.4: & and < must be escaped in character data).
  assert.equal(lines[1], '<title id="diagram-title">Night Notes &amp; the Kestrel Ridge &lt;diagram&gt;</title>');
  assert.equal(lines[2], '<desc id="diagram-desc">Kestrel Ridge &quot;test&quot;</desc>');
  assert.equal(lines[3], `<rect width="1200" height="675" fill="${theme.paper}"/>`);
  assert.equal(lines[4], body, 'the body comes right after the paper, under header and legend');
  assert.equal(svg.match(/class="swatch"/g)?.length, 2, 'one swatch per legend entry');
  assert.ok(lines.at(-1) === '</svg>');
  // The body's room: the header ends above the middle of the page, the footer fits under it.
  assert.ok(page.headerBottom > 0 && page.headerBottom < size.heightPx / 2, `header ends at ${page.headerBottom}`);
  assert.ok(page.headerBottom + page.footerHeight < size.heightPx, 'header and footer leave room for the body');
});

test('a long legend wraps into more rows, and the footer grows by them', () => {
  const spec = (count: number) => pageFrame({
    size, theme, id: 'x', title: 't', subtitle: 's', description: 'd', smallPrint: 'p',
    legend: Array.from({ length: count }, (_, i) => entry(`legend entry number ${i} with some words`)),
    legendSetting: { swatchUnits: 14, gapUnits: 14, gapInWidth: true }, headerGapUnits: 16,
  });
  const rowHeight = spec(1).layout.legendStyle.sizePx * 1.7;
  assert.equal(spec(1).footerHeight, spec(2).footerHeight, 'two short entries share a row');
  const rows = Math.round((spec(12).footerHeight - spec(1).footerHeight) / rowHeight) + 1;
  assert.ok(rows >= 3, `twelve long entries take ${rows} rows on a 1200-px page`);
});

test('a line layer and its legend swatch carry the same stroke attributes', () => {
  const unit = 1.3;
  for (const spec of [boundaryStrong(theme), boundaryLight(theme), fieldStroke(theme)]) {
    const attributes = strokeAttributes(spec, unit);
    assert.ok(strokedPath('M0,0L1,1', spec, unit).includes(attributes));
    assert.ok(lineSwatch(spec, unit)(0, 0, 10).includes(attributes));
  }
  // The light boundary is dashed with round caps, the strong one is solid (they must read apart in the legend too).
  assert.match(strokeAttributes(boundaryLight(theme), unit), /stroke-dasharray="1\.95 3\.25" stroke-linecap="round"/);
  assert.doesNotMatch(strokeAttributes(boundaryStrong(theme), unit), /dasharray/);
});

test('on a rendered map, each boundary and field stroke appears in a layer and in the legend', async () => {
  const file = await render({ theme: 'print', width: 1200, height: 675, format: 'svg' });
  const svg = Buffer.from(file.bytes).toString('utf8');
  const unit = Math.sqrt(1200 * 675) / 900;
  for (const spec of [boundaryStrong(theme), boundaryLight(theme), fieldStroke(theme)]) {
    const attributes = strokeAttributes(spec, unit);
    const layers = svg.split('\n').filter((l) => l.includes(`fill="none" ${attributes}`)).length;
    const swatches = svg.split('\n').filter((l) => /^<path d="M[\d.]+,[\d.]+h[\d.]+" /.test(l) && l.includes(attributes)).length;
    assert.ok(layers >= 1, `a layer drawn with ${attributes}`);
    assert.equal(swatches, 1, `one legend swatch drawn with ${attributes}`);
  }
});
