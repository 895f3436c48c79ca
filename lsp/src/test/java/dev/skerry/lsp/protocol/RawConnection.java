package dev.skerry.lsp.protocol;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.Pipe;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.jsonrpc.Launcher;
import org.eclipse.lsp4j.launch.LSPLauncher;
import org.eclipse.lsp4j.services.LanguageClient;

/** Our server over a pair of pipes, spoken to with hand-written JSON-RPC frames (including broken ones). */
final class RawConnection implements AutoCloseable {
  final SkerryLanguageServer server = new SkerryLanguageServer(Duration.ofMillis(20), code -> { });
  private final OutputStream toServer;
  private final OutputStream fromServerSink;
  private final BlockingQueue<JsonObject> received = new LinkedBlockingQueue<>();

  RawConnection() throws IOException {
    Pipe in = Pipe.open();
    InputStream serverIn = Channels.newInputStream(in.source());
    toServer = Channels.newOutputStream(in.sink());
    Pipe out = Pipe.open();
    InputStream fromServer = Channels.newInputStream(out.source());
    fromServerSink = Channels.newOutputStream(out.sink());
    Launcher<LanguageClient> launcher = LSPLauncher.createServerLauncher(server, serverIn, fromServerSink);
    server.connect(launcher.getRemoteProxy());
    launcher.startListening();
    Thread reader = new Thread(() -> readFrames(fromServer), "raw-reader");
    reader.setDaemon(true);
    reader.start();
  }

  void send(String body) throws IOException {
    byte[] bytes = body.getBytes(StandardCharsets.UTF_8);
    toServer.write(("Content-Length: " + bytes.length + "\r\n\r\n").getBytes(StandardCharsets.US_ASCII));
    toServer.write(bytes);
    toServer.flush();
  }

  void sendRaw(String anything) throws IOException {
    toServer.write(anything.getBytes(StandardCharsets.UTF_8));
    toServer.flush();
  }

  /** The response to request {@code id}, skipping notifications; fails after five seconds. */
  JsonObject response(int id) throws InterruptedException {
    long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(5);
    while (System.nanoTime() < deadline) {
      JsonObject m = received.poll(100, TimeUnit.MILLISECONDS);
      if (m != null && m.has("id") && !m.get("id").isJsonNull() && m.get("id").getAsString().equals(Integer.toString(id))) {
        return m;
      }
    }
    throw new AssertionError("no response to request " + id + " within 5 s");
  }

  private void readFrames(InputStream in) {
    try {
      while (true) {
        int length = -1;
        String line;
        while (!(line = readLine(in)).isEmpty()) {
          if (line.toLowerCase().startsWith("content-length:")) {
            length = Integer.parseInt(line.substring(15).trim());
          }
        }
        byte[] body = in.readNBytes(length);
        received.add(JsonParser.parseString(new String(body, StandardCharsets.UTF_8)).getAsJsonObject());
      }
    } catch (IOException | RuntimeException e) {
      // The connection closed; the test is over.
    }
  }

  private static String readLine(InputStream in) throws IOException {
    ByteArrayOutputStream line = new ByteArrayOutputStream();
    int c;
    while ((c = in.read()) != '\n') {
      if (c < 0) {
        throw new IOException("the stream ended");
      }
      if (c != '\r') {
        line.write(c);
      }
    }
    return line.toString(StandardCharsets.US_ASCII);
  }

  @Override
  public void close() throws IOException {
    toServer.close();
    fromServerSink.close();
  }
}
