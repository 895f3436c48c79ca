// Tokenises every Skerry file we can find with the TextMate grammar and checks that nothing is
// left unmatched, that a handful of constructs get the scopes themes colour them by, and that
// the grammar's keyword lists agree with the lexer in Skerry.g4.

import { test, before } from 'node:test';
import assert from 'node:assert/strict';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import {
  EXTENSION_DIR,
  loadSkerryGrammar,
  scopesOf,
  tokenize,
  tokensWithText,
  unmatchedText,
} from './textmate.mjs';

const REPO_ROOT = path.resolve(EXTENSION_DIR, '..', '..');
const EXAMPLES_DIR = path.join(REPO_ROOT, 'examples');
const SAMPLES_DIR = path.join(EXTENSION_DIR, 'test', 'samples');
const LEXER_GRAMMAR = path.join(REPO_ROOT, 'grammar', 'src', 'main', 'antlr4', 'dev', 'skerry', 'grammar', 'Skerry.g4');

let grammar;
before(async () => {
  grammar = await loadSkerryGrammar();
});

function skerryFilesUnder(dir) {
  if (!existsSync(dir)) {
    return [];
  }
  return readdirSync(dir, { recursive: true, withFileTypes: true })
    .filter((entry) => entry.isFile() && entry.name.endsWith('.skerry'))
    .map((entry) => path.join(entry.parentPath ?? entry.path, entry.name))
    .sort();
}

function tokenizeSnippet(text) {
  return tokenize(grammar, text).tokens;
}

function hasScope(scopes, prefix) {
  return scopes.some((scope) => scope === prefix || scope.startsWith(prefix + '.'));
}

/** The keywords of the lexer: rules of the form `NAME : 'word';`. */
function lexerKeywords() {
  const source = readFileSync(LEXER_GRAMMAR, 'utf8');
  const keywords = [...source.matchAll(/^[A-Z_]+\s*:\s*'([a-z_]+)'\s*;/gm)].map((m) => m[1]);
  assert.ok(keywords.length >= 30, `found only ${keywords.length} keywords in ${LEXER_GRAMMAR}`);
  return keywords;
}

test('every .skerry file under examples/ and test/samples/ is matched to the last character', () => {
  const examples = skerryFilesUnder(EXAMPLES_DIR);
  const samples = skerryFilesUnder(SAMPLES_DIR);
  const files = [...examples, ...samples];
  assert.ok(samples.length >= 3, `expected the samples in ${SAMPLES_DIR}`);

  let lines = 0;
  let tokens = 0;
  const problems = [];
  for (const file of files) {
    const result = tokenize(grammar, readFileSync(file, 'utf8'));
    lines += result.lineCount;
    tokens += result.tokens.length;
    for (const miss of unmatchedText(result.tokens)) {
      problems.push(`${path.relative(REPO_ROOT, file)}:${miss.line}:${miss.column + 1}: unmatched "${miss.text}"`);
    }
  }
  console.log(
    `tokenised ${files.length} files (${examples.length} from examples/, ${samples.length} samples): ` +
      `${lines} lines, ${tokens} tokens` +
      (existsSync(EXAMPLES_DIR) ? '' : '; examples/ does not exist yet'),
  );
  assert.deepEqual(problems, [], `text no grammar rule matched:\n${problems.join('\n')}`);
});

test('the unmatched-text check reports characters the language does not have', () => {
  const tokens = tokenizeSnippet('zone z box (0, 0) to (1, 1) @ ~\ninclude "no end');
  assert.deepEqual(
    unmatchedText(tokens).map((miss) => `${miss.line}:${miss.column}:${miss.text}`),
    ['1:28:@', '1:30:~', '2:8:"'],
  );
});

test('declarations: keywords and the names they introduce', () => {
  const tokens = tokenizeSnippet(
    [
      'scenario gull_point',
      'const clearance = 2 m',
      'vehicle box {',
      '  start (0, 0) at rest',
      '}',
      'area basin box (0, 0) to (9, 9)',
      'zone reef polygon (1,1) (2,1) (2,2)',
      'target berth point (8, 8) within 1 m at rest',
      'waypoint w1 (4, 4) within 1 m',
    ].join('\n'),
  );
  assert.ok(hasScope(scopesOf(tokens, 'zone'), 'keyword.declaration.skerry'));
  assert.ok(hasScope(scopesOf(tokens, 'vehicle'), 'keyword.declaration.skerry'));
  assert.ok(hasScope(scopesOf(tokens, 'gull_point'), 'entity.name.namespace.scenario'));
  assert.ok(hasScope(scopesOf(tokens, 'clearance'), 'entity.name.variable.constant'));
  assert.ok(hasScope(scopesOf(tokens, 'reef'), 'entity.name.type.zone'));
  assert.ok(hasScope(scopesOf(tokens, 'basin'), 'entity.name.type.area'));
  assert.ok(hasScope(scopesOf(tokens, 'berth'), 'entity.name.type.target'));
  assert.ok(hasScope(scopesOf(tokens, 'w1'), 'entity.name.type.waypoint'));
  const [vehicleName, areaShape] = tokensWithText(tokens, 'box');
  assert.ok(hasScope(vehicleName.scopes, 'entity.name.type.vehicle'), 'a keyword may name a vehicle');
  assert.ok(hasScope(areaShape.scopes, 'keyword.other.shape'));
  assert.ok(hasScope(scopesOf(tokens, 'polygon'), 'keyword.other.shape'));
  assert.ok(hasScope(scopesOf(tokens, 'point'), 'keyword.other.shape'));
  assert.ok(tokensWithText(tokens, 'rest').every((t) => hasScope(t.scopes, 'constant.language.motion')));
});

test('numbers, units after numbers and points, and operators', () => {
  const tokens = tokenizeSnippet(
    [
      'units m, s, m/s^2, %',
      'const a = -1.5e-3 km/h * 2.',
      'const b = .5 m/s2 + 3kn',
      'const c = 4E+2 % - 0.5%',
      'waypoint w (1, -2) deg within 1 m',
    ].join('\n'),
  );
  const compound = tokensWithText(tokens, 'm/s^2');
  assert.equal(compound.length, 1, '`m/s^2` is one token');
  assert.ok(hasScope(compound[0].scopes, 'keyword.other.unit'));
  for (const unit of ['km/h', 'm/s2', 'kn', 'deg']) {
    assert.ok(hasScope(scopesOf(tokens, unit), 'keyword.other.unit'), unit);
  }
  assert.ok(tokensWithText(tokens, 'm').every((t) => hasScope(t.scopes, 'keyword.other.unit')));
  assert.ok(tokensWithText(tokens, '%').every((t) => hasScope(t.scopes, 'keyword.other.unit.percent')));
  for (const number of ['1.5e-3', '2.', '.5', '3', '4E+2', '0.5', '2', '1']) {
    const found = tokensWithText(tokens, number);
    assert.ok(found.length > 0 && found.every((t) => hasScope(t.scopes, 'constant.numeric')), number);
  }
  const minus = tokensWithText(tokens, '-');
  assert.equal(minus.length, 3);
  assert.ok(minus.every((t) => hasScope(t.scopes, 'keyword.operator.arithmetic')));
  assert.ok(hasScope(scopesOf(tokens, '*'), 'keyword.operator.arithmetic'));
  assert.ok(tokensWithText(tokens, '=').every((t) => hasScope(t.scopes, 'keyword.operator.assignment')));
});

test('a keyword after a number is no unit', () => {
  const tokens = tokenizeSnippet('plan {\n  horizon 40 step 1 s\n}\ntarget t point (1, 2) within 3 at rest');
  assert.ok(hasScope(scopesOf(tokens, 'step'), 'keyword.other.option.plan'));
  assert.ok(hasScope(scopesOf(tokens, 's'), 'keyword.other.unit'));
  assert.ok(hasScope(scopesOf(tokens, 'within'), 'keyword.other.connective'));
  assert.ok(hasScope(scopesOf(tokens, 'at'), 'keyword.other.connective'));
});

test('no keyword of the lexer is taken for a unit, after a number or after a point', () => {
  const asUnit = [];
  for (const word of [...lexerKeywords(), 'm']) {
    for (const text of [`const c = 3 ${word}`, `waypoint w (1, 2) ${word}`, `plan {\n  horizon 3 ${word}\n}`]) {
      const tokens = tokenizeSnippet(text).filter((t) => t.text === word);
      if (tokens.some((t) => hasScope(t.scopes, 'keyword.other.unit'))) {
        asUnit.push(word);
        break;
      }
    }
  }
  // `m` is the control: an ordinary word after a number must be a unit.
  assert.deepEqual(asUnit, ['m']);
});

test('every keyword of the lexer is highlighted as a keyword somewhere in the samples', () => {
  const seen = new Set();
  for (const file of skerryFilesUnder(SAMPLES_DIR)) {
    for (const token of tokenize(grammar, readFileSync(file, 'utf8')).tokens) {
      if (hasScope(token.scopes, 'keyword') || hasScope(token.scopes, 'constant.language')) {
        seen.add(token.text);
      }
    }
  }
  const missing = lexerKeywords().filter((keyword) => !seen.has(keyword));
  assert.deepEqual(missing, [], `keywords never highlighted in ${SAMPLES_DIR}`);
});

test('words mean what their block makes of them', () => {
  const tokens = tokenizeSnippet(
    [
      'vehicle v {',
      '  sides 8',
      '  radius step',
      '}',
      'plan {',
      '  sides 12',
      '  minimize time + 0.1 fuel',
      '  clusters 2 ordered',
      '  solver exact time_limit 30 s gap 1e-2 threads 2',
      '  guard on',
      '  pruning off',
      '}',
    ].join('\n'),
  );
  const [vehicleSides, planSides] = tokensWithText(tokens, 'sides');
  assert.ok(hasScope(vehicleSides.scopes, 'keyword.other.property.vehicle'));
  assert.ok(hasScope(vehicleSides.scopes, 'meta.block.vehicle'));
  assert.ok(hasScope(planSides.scopes, 'keyword.other.option.plan'));
  assert.ok(hasScope(planSides.scopes, 'meta.block.plan'));
  assert.ok(hasScope(scopesOf(tokens, 'step'), 'variable.other'), 'a plan keyword in a vehicle is a name');
  assert.ok(hasScope(scopesOf(tokens, 'time'), 'constant.language.objective'));
  assert.ok(hasScope(scopesOf(tokens, 'fuel'), 'constant.language.objective'));
  assert.ok(hasScope(scopesOf(tokens, 'ordered'), 'support.constant.clusters'));
  assert.ok(hasScope(scopesOf(tokens, 'exact'), 'support.constant.solver'));
  assert.ok(hasScope(scopesOf(tokens, 'time_limit'), 'keyword.other.option.solver'));
  assert.ok(hasScope(scopesOf(tokens, 'on'), 'constant.language.switch'));
  assert.ok(hasScope(scopesOf(tokens, 'off'), 'constant.language.switch'));
  const closing = tokensWithText(tokens, '}');
  assert.ok(closing.every((t) => hasScope(t.scopes, 'punctuation.section.block.end')));
});

test('comments of all three kinds and strings', () => {
  const tokens = tokenizeSnippet(
    [
      'zone a box (0, 0) to (1, 1)   // slash comment',
      '# hash comment',
      '/* block',
      '   zone not_code box (0, 0) to (1, 1)',
      '*/ zone b box (2, 2) to (3, 3)',
      'include "sub dir/piers.skerry" /* inline */ # trailing',
    ].join('\n'),
  );
  assert.ok(hasScope(scopesOf(tokens, '//'), 'punctuation.definition.comment'));
  assert.ok(hasScope(scopesOf(tokens, ' slash comment'), 'comment.line.double-slash'));
  assert.ok(hasScope(scopesOf(tokens, ' hash comment'), 'comment.line.number-sign'));
  assert.ok(hasScope(scopesOf(tokens, ' trailing'), 'comment.line.number-sign'));
  const insideBlock = tokens.filter((t) => t.line === 4);
  assert.ok(insideBlock.length > 0 && insideBlock.every((t) => hasScope(t.scopes, 'comment.block')));
  assert.ok(hasScope(scopesOf(tokens, 'b'), 'entity.name.type.zone'), 'code resumes after */');
  assert.ok(hasScope(scopesOf(tokens, 'sub dir/piers.skerry'), 'string.quoted.double'));
  assert.ok(hasScope(scopesOf(tokens, ' inline '), 'comment.block'));
});

test('a vehicle or plan declaration ends at the brace that closes it', () => {
  const tokens = tokenizeSnippet('vehicle v { radius 1 m } zone z box (0, 0) to (1, 1)\nplan { horizon 4 } const k = 2');
  assert.ok(hasScope(scopesOf(tokens, 'radius'), 'meta.block.vehicle'));
  assert.ok(!hasScope(scopesOf(tokens, 'zone'), 'meta.declaration.vehicle'));
  assert.ok(hasScope(scopesOf(tokens, 'z'), 'entity.name.type.zone'));
  assert.ok(!hasScope(scopesOf(tokens, 'const'), 'meta.declaration.plan'));
  assert.ok(hasScope(scopesOf(tokens, 'k'), 'entity.name.variable.constant'));
});

test('a declaration that starts a line ends a vehicle whose body never opened', () => {
  const tokens = tokenizeSnippet('vehicle v\nzone z box (0, 0) to (1, 1)');
  assert.ok(!hasScope(scopesOf(tokens, 'zone'), 'meta.declaration.vehicle'));
  assert.ok(hasScope(scopesOf(tokens, 'z'), 'entity.name.type.zone'));
});
