// Decides which program starts the Skerry language server. Kept free of the `vscode` module so
// that it can be tested with plain Node.

import * as fs from 'node:fs';
import * as path from 'node:path';

/** Name of the launcher looked up on PATH when nothing better is known. */
export const LAUNCHER_NAME = 'skerry';

/** Where the repository keeps its launcher, relative to a workspace folder. */
export const WORKSPACE_LAUNCHER = path.join('bin', 'skerry');

export type LauncherSource = 'setting' | 'workspace' | 'path';

export interface ServerCommand {
  command: string;
  args: string[];
  /** Working directory for the server: the first workspace folder, if any. */
  cwd: string | undefined;
  /** Why this launcher was chosen, for the log. */
  source: LauncherSource;
}

export interface ServerSettings {
  /** `skerry.server.path`; empty or blank means "choose for me". */
  path: string;
  /** `skerry.server.args`. */
  args: readonly string[];
}

/** True when `file` exists, is a regular file, and may be executed by this process. */
export function isExecutableFile(file: string): boolean {
  try {
    if (!fs.statSync(file).isFile()) {
      return false;
    }
    fs.accessSync(file, fs.constants.X_OK);
    return true;
  } catch {
    return false;
  }
}

/**
 * Resolves the settings to a command line.
 *
 * - A non-blank `path` wins. `${workspaceFolder}` in it becomes the first workspace folder, and a
 *   relative path containing a separator (e.g. `bin/skerry`) is taken from that folder; a bare
 *   name (e.g. `skerry`) is left for the operating system to find on PATH.
 * - Otherwise the first workspace folder holding an executable `bin/skerry` is used, but only
 *   in a trusted workspace: running a program that came with the folder is what trust is for.
 * - Otherwise `skerry` on PATH.
 */
export function resolveServerCommand(
  settings: ServerSettings,
  workspaceFolders: readonly string[],
  isExecutable: (file: string) => boolean = isExecutableFile,
  workspaceTrusted = true,
): ServerCommand {
  const firstFolder = workspaceFolders.length > 0 ? workspaceFolders[0] : undefined;
  const args = [...settings.args];
  const configured = settings.path.trim();

  if (configured !== '') {
    let command = configured;
    if (firstFolder !== undefined) {
      command = command.split('${workspaceFolder}').join(firstFolder);
      const hasSeparator = command.includes('/') || command.includes(path.sep);
      if (hasSeparator && !path.isAbsolute(command)) {
        command = path.join(firstFolder, command);
      }
    }
    return { command, args, cwd: firstFolder, source: 'setting' };
  }

  for (const folder of workspaceTrusted ? workspaceFolders : []) {
    const candidate = path.join(folder, WORKSPACE_LAUNCHER);
    if (isExecutable(candidate)) {
      return { command: candidate, args, cwd: folder, source: 'workspace' };
    }
  }

  return { command: LAUNCHER_NAME, args, cwd: firstFolder, source: 'path' };
}
