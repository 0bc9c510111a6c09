package org.precedence.cli;

import com.google.gson.GsonBuilder;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.precedence.runtime.catalog.Catalog;
import org.precedence.runtime.catalog.CatalogEntry;
import org.precedence.runtime.catalog.CatalogGenerator;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code precedence catalog}: lists the shipped sets, or regenerates the catalog file. */
@Command(name = "catalog", mixinStandardHelpOptions = true,
        description = {"List the shipped catalog of proven order-fair sets.",
            "With --regenerate FILE, rerun the searches that produce it and write FILE atomically."})
final class CatalogCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    FormatOption format;

    @Option(names = "--players", paramLabel = "N", description = "Only entries for N dice.")
    Integer players;

    @Option(names = "--regenerate", paramLabel = "FILE",
            description = "Regenerate the catalog from the search and write it to FILE.")
    Path regenerate;

    @Override
    public Integer call() throws IOException {
        if (players != null && players < 2) {
            throw new UserInputException("--players must be at least 2, got " + players);
        }
        PrintWriter out = spec.commandLine().getOut();
        if (regenerate != null) {
            Path dir = regenerate.toAbsolutePath().getParent();
            if (dir == null || !Files.isDirectory(dir)) {
                throw new UserInputException("--regenerate: directory " + dir + " does not exist");
            }
            if (Files.isDirectory(regenerate)) {
                throw new UserInputException("--regenerate: " + regenerate + " is a directory");
            }
            PrintWriter err = spec.commandLine().getErr();
            List<CatalogEntry> written = CatalogGenerator.regenerate(regenerate, line -> {
                err.println("catalog: " + line);
                err.flush();
            });
            out.println("wrote " + written.size() + " entries to " + regenerate);
            out.flush();
            return ExitCodes.OK;
        }
        List<CatalogEntry> entries = players == null ? Catalog.shipped().entries()
                : Catalog.shipped().entries(players);
        if (format.json()) {
            out.println(json(entries));
        } else {
            text(out, entries);
        }
        out.flush();
        return ExitCodes.OK;
    }

    private static String json(List<CatalogEntry> entries) {
        List<Map<String, Object>> list = entries.stream().map(e -> {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("id", e.id());
            m.put("players", e.players());
            m.put("sides", e.sides());
            m.put("grade", gradeText(e));
            m.put("subsetDepth", e.subsetDepth());
            m.put("sha256", e.sha256());
            m.put("dice", e.dice());
            m.put("provenance", e.provenance());
            return m;
        }).toList();
        return new GsonBuilder().setPrettyPrinting().disableHtmlEscaping().create().toJson(list);
    }

    private static String gradeText(CatalogEntry e) {
        return e.grade().name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
    }

    private static void text(PrintWriter out, List<CatalogEntry> entries) {
        if (entries.isEmpty()) {
            out.println("no catalog entries match");
            return;
        }
        String fmt = "%-14s %7s  %-22s %6s  %-10s %5s  %-17s %s%n";
        out.printf(fmt, "id", "players", "sides", "faces", "grade", "depth", "found by", "sha256");
        for (CatalogEntry e : entries) {
            String sides = e.sides().stream().distinct().count() == 1
                    ? e.players() + " x " + e.sides().get(0)
                    : String.join(",", e.sides().stream().map(String::valueOf).toList());
            out.printf(fmt, e.id(), e.players(), sides, e.totalFaces(), gradeText(e),
                    e.subsetDepth(), e.provenance().method(), e.sha256().substring(0, 16) + "…");
        }
    }
}
