package dev.skerry.lsp.nvim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Debian's Neovim 0.7.2, a client we did not write, runs headless against our server started as
 * its own process, on a broken example and on a clean one. Needs {@code /usr/bin/nvim} (CI
 * installs Debian's {@code neovim}); without it the test fails and says so.
 */
class NeovimClientTest {
  private static final Path NVIM = Path.of("/usr/bin/nvim");

  @TempDir
  Path dir;

  /** The lines the Lua script printed, each one JSON value. */
  private List<JsonObject> runNeovim(Path file, String requests) throws IOException, InterruptedException {
    if (!Files.isExecutable(NVIM)) {
      fail("Neovim is missing at " + NVIM + ": install Debian's package (apt-get install -y neovim); CI does");
    }
    Path target = Path.of("target").toAbsolutePath();
    String classpath = target.resolve("classes") + ":" + Files.readString(target.resolve("runtime-classpath.txt")).strip();
    String script = """
        local published = false
        local original = vim.lsp.handlers['textDocument/publishDiagnostics']
        vim.lsp.handlers['textDocument/publishDiagnostics'] = function(err, result, ctx, config)
          original(err, result, ctx, config)
          published = true
        end
        local function say(value) io.stdout:write(vim.json.encode(value) .. '\\n') end
        vim.cmd('edit ' .. vim.fn.fnameescape(%s))
        local buf = vim.api.nvim_get_current_buf()
        local id = vim.lsp.start_client({ name = 'skerry', root_dir = %s,
          cmd = { 'java', '-cp', %s, 'dev.skerry.lsp.Main' } })
        vim.lsp.buf_attach_client(buf, id)
        if not vim.wait(30000, function() return published end, 50) then
          say({ kind = 'timeout' })
          vim.cmd('qa!')
        end
        for _, d in ipairs(vim.diagnostic.get(buf)) do
          local lsp = d.user_data and d.user_data.lsp or {}
          say({ kind = 'diagnostic', code = d.code, line = d.lnum, col = d.col,
                related = #(lsp.relatedInformation or {}) })
        end
        local client = vim.lsp.get_client_by_id(id)
        local uri = vim.uri_from_bufnr(buf)
        local function ask(method, line, character)
          local reply = client.request_sync(method, { textDocument = { uri = uri },
            position = { line = line, character = character } }, 10000, buf)
          say({ kind = method, result = reply and reply.result or vim.NIL })
        end
        %s
        vim.lsp.stop_client(id)
        vim.cmd('qa!')
        """.formatted(lua(file.toString()), lua(dir.toString()), lua(classpath), requests);
    Path lua = dir.resolve("client.lua");
    Files.writeString(lua, script);
    Process p = new ProcessBuilder(NVIM.toString(), "--headless", "-u", "NONE", "-c", "luafile " + lua)
        .directory(dir.toFile()).redirectErrorStream(false).redirectInput(ProcessBuilder.Redirect.PIPE).start();
    p.getOutputStream().close();
    if (!p.waitFor(90, TimeUnit.SECONDS)) {
      p.destroyForcibly();
      fail("Neovim did not finish within 90 s");
    }
    String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
    List<JsonObject> lines = new ArrayList<>();
    for (String line : out.split("\n")) {
      if (line.startsWith("{")) {
        lines.add(JsonParser.parseString(line).getAsJsonObject());
      }
    }
    assertTrue(lines.stream().noneMatch(l -> l.get("kind").getAsString().equals("timeout")),
        "Neovim saw no diagnostics within 30 s; output: " + out);
    return lines;
  }

  private static String lua(String s) {
    return "'" + s.replace("\\", "\\\\").replace("'", "\\'") + "'";
  }

  private static int lineOf(String text, String needle) {
    int at = text.indexOf(needle);
    assertTrue(at >= 0, needle);
    return (int) text.substring(0, at).chars().filter(c -> c == '\n').count();
  }

  @Test
  void neovimShowsTheCodesAndLinesOfABrokenExample() throws Exception {
    Path examples = Path.of("..", "examples").toAbsolutePath().normalize();
    Files.createDirectories(dir.resolve("shared"));
    Files.copy(examples.resolve("shared/tern_cove_moorings.skerry"), dir.resolve("shared/tern_cove_moorings.skerry"));
    String text = Files.readString(examples.resolve("harbour_survey.skerry"))
        .replace("horizon 40", "horizon 5")
        .replace("zone shoal polygon (48, 30) (58, 26) (62, 34) (52, 40)",
            "zone shoal polygon (52, 40) (62, 34) (58, 26) (48, 30)");
    Path file = dir.resolve("harbour_broken.skerry");
    Files.writeString(file, text);
    List<JsonObject> out = runNeovim(file, "");
    List<String> seen = out.stream().filter(o -> o.get("kind").getAsString().equals("diagnostic"))
        .map(o -> o.get("code").getAsString() + "@" + o.get("line").getAsInt() + ":" + o.get("col").getAsInt()
            + " related " + o.get("related").getAsInt())
        .sorted().toList();
    int polygonCol = text.split("\n")[lineOf(text, "zone shoal")].indexOf("polygon");
    assertEquals(List.of(
        "horizon-too-short@" + lineOf(text, "horizon 5") + ":2 related 1",
        "polygon-clockwise@" + lineOf(text, "zone shoal") + ":" + polygonCol + " related 0"), seen);
  }

  @Test
  void neovimGetsHoverAndCompletionOnACleanExample() throws Exception {
    Path examples = Path.of("..", "examples").toAbsolutePath().normalize();
    Path file = dir.resolve("rocks.skerry");
    String text = Files.readString(examples.resolve("rock_field.skerry"));
    Files.writeString(file, text);
    int zoneLine = lineOf(text, "zone rock_01");
    int planLine = lineOf(text, "  horizon 30");
    List<JsonObject> out = runNeovim(file, """
        ask('textDocument/hover', %d, 6)
        ask('textDocument/completion', %d, 2)
        """.formatted(zoneLine, planLine));
    assertTrue(out.stream().noneMatch(o -> o.get("kind").getAsString().equals("diagnostic")), out::toString);
    JsonElement hover = out.stream().filter(o -> o.get("kind").getAsString().equals("textDocument/hover")).findFirst()
        .orElseThrow().get("result");
    String value = hover.getAsJsonObject().getAsJsonObject("contents").get("value").getAsString();
    assertTrue(value.contains("zone `rock_01` (box)"), value);
    assertTrue(value.contains("x 24.5 … 28.6 m, y 19.6 … 22.8 m"), value);
    JsonArray items = out.stream().filter(o -> o.get("kind").getAsString().equals("textDocument/completion"))
        .findFirst().orElseThrow().getAsJsonObject("result").getAsJsonArray("items");
    List<String> labels = new ArrayList<>();
    items.forEach(i -> labels.add(i.getAsJsonObject().get("label").getAsString()));
    assertTrue(labels.contains("guard") && labels.contains("pruning"), labels::toString);
    assertTrue(!labels.contains("step") && !labels.contains("vehicle"), "the plan has a step; vehicle is top level: " + labels);
  }
}
