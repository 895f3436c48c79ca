// Loads the Skerry TextMate grammar the way the editor does (vscode-textmate on the Oniguruma
// regular-expression engine compiled to WebAssembly) and tokenises whole texts with it.

import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';
import path from 'node:path';
import textmate from 'vscode-textmate';
import oniguruma from 'vscode-oniguruma';

const require = createRequire(import.meta.url);
const here = path.dirname(fileURLToPath(import.meta.url));

export const ROOT_SCOPE = 'source.skerry';
export const EXTENSION_DIR = path.resolve(here, '..');
export const GRAMMAR_PATH = path.join(EXTENSION_DIR, 'syntaxes', 'skerry.tmLanguage.json');

/** Returns the compiled grammar; throws when the file is not a grammar of `source.skerry`. */
export async function loadSkerryGrammar() {
  const wasm = readFileSync(require.resolve('vscode-oniguruma/release/onig.wasm'));
  await oniguruma.loadWASM(wasm.buffer.slice(wasm.byteOffset, wasm.byteOffset + wasm.byteLength));
  const registry = new textmate.Registry({
    onigLib: Promise.resolve({
      createOnigScanner: (patterns) => new oniguruma.OnigScanner(patterns),
      createOnigString: (text) => new oniguruma.OnigString(text),
    }),
    loadGrammar: async (scopeName) => {
      if (scopeName !== ROOT_SCOPE) {
        return null;
      }
      return textmate.parseRawGrammar(readFileSync(GRAMMAR_PATH, 'utf8'), GRAMMAR_PATH);
    },
  });
  const grammar = await registry.loadGrammar(ROOT_SCOPE);
  if (grammar === null) {
    throw new Error(`no grammar for ${ROOT_SCOPE} in ${GRAMMAR_PATH}`);
  }
  return grammar;
}

/**
 * Tokenises `text` line by line, carrying the rule stack across lines as the editor does.
 * Returns one entry per token: 1-based `line`, 0-based `column`, its `text` and its `scopes`
 * (outermost first).
 */
export function tokenize(grammar, text) {
  const tokens = [];
  const lines = text.split(/\r?\n/);
  let state = textmate.INITIAL;
  lines.forEach((lineText, index) => {
    const result = grammar.tokenizeLine(lineText, state);
    for (const token of result.tokens) {
      const end = Math.min(token.endIndex, lineText.length);
      if (token.startIndex >= end) {
        continue;
      }
      tokens.push({
        line: index + 1,
        column: token.startIndex,
        text: lineText.slice(token.startIndex, end),
        scopes: token.scopes,
      });
    }
    state = result.ruleStack;
  });
  return { tokens, lineCount: lines.length };
}

/**
 * Text that no rule of the grammar matched: every non-whitespace run inside a token whose only
 * scope is the root scope.
 */
export function unmatchedText(tokens) {
  const unmatched = [];
  for (const token of tokens) {
    if (token.scopes.length !== 1 || token.scopes[0] !== ROOT_SCOPE) {
      continue;
    }
    for (const match of token.text.matchAll(/\S+/g)) {
      unmatched.push({ line: token.line, column: token.column + match.index, text: match[0] });
    }
  }
  return unmatched;
}

/** The tokens whose text is exactly `text`, in order. */
export function tokensWithText(tokens, text) {
  return tokens.filter((token) => token.text === text);
}

/** The scopes of the only token spelt `text`; fails when there are none or several. */
export function scopesOf(tokens, text) {
  const found = tokensWithText(tokens, text);
  if (found.length !== 1) {
    throw new Error(`expected one token "${text}", found ${found.length}`);
  }
  return found[0].scopes;
}
