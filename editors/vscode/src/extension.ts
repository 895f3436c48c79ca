// The Skerry extension: a language client that starts `skerry lsp` (or the configured launcher)
// and talks LSP with it over stdio, plus a command to restart it.

import * as vscode from 'vscode';
import {
  LanguageClient,
  type LanguageClientOptions,
  type ServerOptions,
} from 'vscode-languageclient/node';
import { resolveServerCommand, type ServerCommand } from './serverCommand';

const CLIENT_ID = 'skerry';
const CLIENT_NAME = 'Skerry Language Server';

let client: LanguageClient | undefined;
let log: vscode.LogOutputChannel | undefined;

export async function activate(context: vscode.ExtensionContext): Promise<void> {
  log = vscode.window.createOutputChannel(CLIENT_NAME, { log: true });
  context.subscriptions.push(log);

  context.subscriptions.push(
    vscode.commands.registerCommand('skerry.restartServer', () => restartClient()),
    vscode.workspace.onDidChangeConfiguration((event) => {
      if (event.affectsConfiguration('skerry.server')) {
        void restartClient();
      }
    }),
    // Trust may unlock the folder's own bin/skerry and its skerry.server.* settings.
    vscode.workspace.onDidGrantWorkspaceTrust(() => restartClient()),
  );

  await startClient();
}

export async function deactivate(): Promise<void> {
  await stopClient();
}

function currentServerCommand(): ServerCommand {
  const config = vscode.workspace.getConfiguration('skerry.server');
  const folders = (vscode.workspace.workspaceFolders ?? [])
    .filter((folder) => folder.uri.scheme === 'file')
    .map((folder) => folder.uri.fsPath);
  return resolveServerCommand(
    {
      path: config.get<string>('path', ''),
      args: config.get<string[]>('args', ['lsp']),
    },
    folders,
    undefined,
    vscode.workspace.isTrusted,
  );
}

async function startClient(): Promise<void> {
  const server = currentServerCommand();
  log?.info(
    `Starting ${server.command} ${server.args.join(' ')} (from ${server.source})` +
      (server.cwd ? ` in ${server.cwd}` : ''),
  );

  // No `transport` on purpose: with TransportKind.stdio the client would append `--stdio` to
  // the arguments, which our launcher does not take. Without it the client still uses stdio.
  const serverOptions: ServerOptions = {
    command: server.command,
    args: server.args,
    options: { cwd: server.cwd },
  };

  const clientOptions: LanguageClientOptions = {
    documentSelector: [
      { scheme: 'file', language: 'skerry' },
      { scheme: 'untitled', language: 'skerry' },
    ],
    synchronize: {
      // Included files change the diagnostics of the files that include them.
      fileEvents: vscode.workspace.createFileSystemWatcher('**/*.skerry'),
    },
    outputChannel: log,
  };

  const candidate = new LanguageClient(CLIENT_ID, CLIENT_NAME, serverOptions, clientOptions);
  try {
    await candidate.start();
    client = candidate;
  } catch (error) {
    const reason = error instanceof Error ? error.message : String(error);
    log?.error(`Could not start the language server: ${reason}`);
    void vscode.window.showErrorMessage(
      `Skerry: could not start the language server with "${server.command}". ` +
        'Set "skerry.server.path" to the skerry launcher (for example <repository>/bin/skerry).',
    );
  }
}

async function stopClient(): Promise<void> {
  const running = client;
  client = undefined;
  if (running !== undefined) {
    await running.stop();
  }
}

async function restartClient(): Promise<void> {
  await stopClient();
  await startClient();
}
