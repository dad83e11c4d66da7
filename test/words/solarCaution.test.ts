/**
 * The solar eye-safety caution carries every content principle of the issue
 * (ISO 12312-2 viewers or projection; never a partial or annular phase
 * unprotected however much is covered; viewers off only in totality, back on
 * at the first bright light; no optics without a front solar filter;
 * supervise children; follow local health authorities; outside the path,
 * "at no time is it safe to look without a filter"), and never the lunar
 * naked-eye line.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { safetyScopeForEclipse, safetyScopeForPlace, solarSafetyText, type SolarSafetyForm, type SolarSafetyScope } from '../../src/words/solar/caution.ts';

const FORMS: SolarSafetyForm[] = ['short', 'long'];
const SCOPES: SolarSafetyScope[] = ['totality', 'no-totality', 'whole-eclipse'];

const PRINCIPLES: [string, RegExp][] = [
  ['ISO 12312-2 viewers', /ISO 12312-2/],
  ['or projection', /project/i],
  ['never a partial or annular phase unprotected', /never[^.]*partial or annular phase[^.]*(without protection|unprotected)/i],
  ['however much is covered', /however much/i],
  ['no optics without a front solar filter', /binoculars, telescopes (and|or) cameras[^.;]*(front solar filter|solar filter fitted over the front)/i],
  ['children', /children/i],
  ['local health authorities', /local health (authorities|advice)/i],
];

test('every form and scope carries each common principle (the issue\'s eye-safety content principles; ISO 12312-2)', () => {
  for (const form of FORMS) {
    for (const scope of SCOPES) {
      const text = solarSafetyText(form, scope);
      for (const [name, pattern] of PRINCIPLES) assert.match(text, pattern, `${form}/${scope}: ${name}`);
    }
  }
});

test('viewers come off only in totality, and go back on at the first bright light; where totality is not seen, never (the issue\'s eye-safety content principles)', () => {
  for (const form of FORMS) {
    const inside = solarSafetyText(form, 'totality');
    assert.match(inside, /only while (the Moon hides the Sun|totality hides the Sun) completely/);
    assert.match(inside, /back on at the first bright light/);
    assert.doesNotMatch(inside, /at no time is it safe/);
    const outside = solarSafetyText(form, 'no-totality');
    assert.match(outside, /at no time is it safe to look without a filter/);
    assert.doesNotMatch(outside, /off only|may viewers come off/, `${form}: no permission to take viewers off where totality is not seen`);
    const map = solarSafetyText(form, 'whole-eclipse');
    assert.match(map, /back on at the first bright light/);
    assert.match(map, /outside (the path|it)[^.]*at no time is it safe to look without a filter/i);
  }
});

test('the outside-the-path sentence reads the same in both forms and fits a map of a partial or annular eclipse as well as a place: no "here" (the issue\'s eye-safety section)', () => {
  const sentence = 'Outside the path of totality, at no time is it safe to look without a filter.';
  for (const form of FORMS) {
    const text = solarSafetyText(form, 'no-totality');
    assert.ok(text.includes(sentence), form);
    assert.doesNotMatch(text, /\bhere\b/i, form);
  }
});

test('never the lunar caution: no "naked eye", no "safe to watch"', () => {
  for (const form of FORMS) {
    for (const scope of SCOPES) {
      const text = solarSafetyText(form, scope);
      assert.doesNotMatch(text, /naked[- ]eye/i);
      assert.doesNotMatch(text, /safe to watch/i);
    }
  }
});

test('scopes: a place sees totality or not; only total and hybrid eclipses have a path where viewers may come off (common practice)', () => {
  assert.equal(safetyScopeForPlace(true), 'totality');
  assert.equal(safetyScopeForPlace(false), 'no-totality');
  assert.equal(safetyScopeForEclipse('total'), 'whole-eclipse');
  assert.equal(safetyScopeForEclipse('hybrid'), 'whole-eclipse');
  assert.equal(safetyScopeForEclipse('annular'), 'no-totality');
  assert.equal(safetyScopeForEclipse('partial'), 'no-totality');
});

test('the short form stays within 460 characters, two lines of a wide map header band (our own layout limit)', () => {
  for (const scope of SCOPES) assert.ok(solarSafetyText('short', scope).length <= 460, scope);
});
