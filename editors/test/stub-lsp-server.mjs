// A stand-in for `skerry lsp` for the editor smoke tests (Neovim, Emacs): speaks just enough LSP over stdio to
// be started, to receive an opened document, and to publish one diagnostic that names it.
// It is no model of the real server's behaviour.

let buffer = Buffer.alloc(0);

function send(message) {
  const body = Buffer.from(JSON.stringify({ jsonrpc: '2.0', ...message }), 'utf8');
  process.stdout.write(`Content-Length: ${body.length}\r\n\r\n`);
  process.stdout.write(body);
}

function handle(message) {
  switch (message.method) {
    case 'initialize':
      send({ id: message.id, result: { capabilities: { textDocumentSync: 1 } } });
      break;
    case 'textDocument/didOpen': {
      const { uri, text } = message.params.textDocument;
      send({
        method: 'textDocument/publishDiagnostics',
        params: {
          uri,
          diagnostics: [
            {
              range: { start: { line: 0, character: 0 }, end: { line: 0, character: 8 } },
              severity: 3,
              code: 'stub-opened',
              source: 'stub',
              message: `stub server saw ${text.split('\n').length} lines`,
            },
          ],
        },
      });
      break;
    }
    case 'shutdown':
      send({ id: message.id, result: null });
      break;
    case 'exit':
      process.exit(0);
      break;
    default:
      if (message.id !== undefined && message.method !== undefined) {
        send({ id: message.id, error: { code: -32601, message: `stub: no ${message.method}` } });
      }
  }
}

process.stdin.on('data', (chunk) => {
  buffer = Buffer.concat([buffer, chunk]);
  for (;;) {
    const headerEnd = buffer.indexOf('\r\n\r\n');
    if (headerEnd < 0) {
      return;
    }
    const length = Number(/Content-Length: (\d+)/i.exec(buffer.subarray(0, headerEnd).toString())[1]);
    const start = headerEnd + 4;
    if (buffer.length < start + length) {
      return;
    }
    handle(JSON.parse(buffer.subarray(start, start + length).toString('utf8')));
    buffer = buffer.subarray(start + length);
  }
});
process.stdin.on('end', () => process.exit(0));
