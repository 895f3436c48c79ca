// How the extension picks the program that starts the language server (src/serverCommand.ts,
// compiled to out/ by `npm run compile`).

import { test } from 'node:test';
import assert from 'node:assert/strict';
import { chmodSync, mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { isExecutableFile, resolveServerCommand } from '../out/serverCommand.js';

const DEFAULT_ARGS = ['lsp'];
const nothingExecutable = () => false;

test('an empty setting falls back to skerry on PATH when no workspace has bin/skerry', () => {
  const server = resolveServerCommand({ path: '  ', args: DEFAULT_ARGS }, ['/w/one'], nothingExecutable);
  assert.deepEqual(server, { command: 'skerry', args: ['lsp'], cwd: '/w/one', source: 'path' });
});

test('an empty setting prefers the first workspace folder that has an executable bin/skerry', () => {
  const asked = [];
  const server = resolveServerCommand({ path: '', args: DEFAULT_ARGS }, ['/w/one', '/w/two'], (file) => {
    asked.push(file);
    return file === path.join('/w/two', 'bin', 'skerry');
  });
  assert.deepEqual(asked, [path.join('/w/one', 'bin', 'skerry'), path.join('/w/two', 'bin', 'skerry')]);
  assert.equal(server.command, path.join('/w/two', 'bin', 'skerry'));
  assert.equal(server.cwd, '/w/two');
  assert.equal(server.source, 'workspace');
});

test('an untrusted workspace never runs its own bin/skerry', () => {
  const everything = () => true;
  const trusted = resolveServerCommand({ path: '', args: DEFAULT_ARGS }, ['/w/one'], everything, true);
  const untrusted = resolveServerCommand({ path: '', args: DEFAULT_ARGS }, ['/w/one'], everything, false);
  assert.equal(trusted.source, 'workspace');
  assert.equal(untrusted.command, 'skerry');
  assert.equal(untrusted.source, 'path');
});

test('a configured path wins and is resolved against the first workspace folder', () => {
  const settings = (p) => ({ path: p, args: ['lsp', '--verbose'] });
  const folders = ['/w/one', '/w/two'];
  const everything = () => true;
  assert.equal(resolveServerCommand(settings('/opt/skerry/bin/skerry'), folders, everything).command, '/opt/skerry/bin/skerry');
  assert.equal(resolveServerCommand(settings('tools/skerry'), folders, everything).command, path.join('/w/one', 'tools', 'skerry'));
  assert.equal(resolveServerCommand(settings('${workspaceFolder}/bin/skerry'), folders, everything).command, '/w/one/bin/skerry');
  const onPath = resolveServerCommand(settings('skerry-nightly'), folders, everything);
  assert.equal(onPath.command, 'skerry-nightly', 'a bare name is left for PATH');
  assert.equal(onPath.source, 'setting');
  assert.deepEqual(onPath.args, ['lsp', '--verbose']);
});

test('without a workspace a relative path is passed on unchanged', () => {
  const server = resolveServerCommand({ path: 'bin/skerry', args: [] }, [], nothingExecutable);
  assert.deepEqual(server, { command: 'bin/skerry', args: [], cwd: undefined, source: 'setting' });
});

test('the arguments are copied, not shared with the settings object', () => {
  const args = ['lsp'];
  const server = resolveServerCommand({ path: '', args }, [], nothingExecutable);
  server.args.push('--extra');
  assert.deepEqual(args, ['lsp']);
});

test('isExecutableFile wants an existing regular file with the execute bit', () => {
  const dir = mkdtempSync(path.join(tmpdir(), 'skerry-launcher-'));
  try {
    const launcher = path.join(dir, 'skerry');
    const plain = path.join(dir, 'notes.txt');
    writeFileSync(launcher, '#!/bin/sh\n');
    chmodSync(launcher, 0o755);
    writeFileSync(plain, 'text');
    chmodSync(plain, 0o644);
    mkdirSync(path.join(dir, 'folder'));
    assert.equal(isExecutableFile(launcher), true);
    assert.equal(isExecutableFile(path.join(dir, 'folder')), false);
    assert.equal(isExecutableFile(path.join(dir, 'missing')), false);
    // Even root is refused a file that has no execute bit at all.
    assert.equal(isExecutableFile(plain), false, 'a file without any execute bit');
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
});
