package org.precedence.runtime.catalog;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.precedence.api.FairnessGrade;
import org.precedence.runtime.dice.DiceSet;
import org.precedence.runtime.dice.InvalidDiceSetException;

/**
 * The catalog of small proven sets that ships inside the runtime.
 *
 * <p>Every entry is checked when the catalog is loaded: the dice must form a valid set whose
 * side counts and number of dice match the entry, written in renumbered form (values 1..total),
 * and whose canonical form hashes to the recorded SHA-256. Any mismatch raises {@link
 * CatalogIntegrityException} naming the entry — a tampered or hand-edited catalog never loads.
 * Grades and depths were computed exactly by the generator; the tests re-verify them.
 *
 * <p>Immutable and thread-safe.
 */
public final class Catalog {
    /** Name of the resource beside this class. */
    public static final String RESOURCE = "catalog.json";

    private final List<CatalogEntry> entries;

    private Catalog(List<CatalogEntry> entries) {
        this.entries = List.copyOf(entries);
    }

    /** Lazily loaded once (class-holder idiom: the JVM guarantees safe one-time init). */
    private static final class Shipped {
        static final Catalog INSTANCE = load();

        private static Catalog load() {
            try (InputStream in = Catalog.class.getResourceAsStream(RESOURCE)) {
                if (in == null) {
                    throw new CatalogIntegrityException("the catalog resource " + RESOURCE
                            + " is missing from the runtime jar");
                }
                return parse(new String(in.readAllBytes(), StandardCharsets.UTF_8),
                        "shipped " + RESOURCE);
            } catch (IOException e) {
                throw new CatalogIntegrityException("cannot read " + RESOURCE + ": " + e, e);
            }
        }
    }

    /**
     * Returns the shipped catalog, loaded and verified on first use.
     *
     * @throws CatalogIntegrityException if the shipped resource fails its checks
     */
    public static Catalog shipped() {
        return Shipped.INSTANCE;
    }

    /**
     * Parses and verifies a catalog document.
     *
     * @param source named in error messages
     * @throws CatalogIntegrityException naming the first entry that fails
     */
    public static Catalog parse(String json, String source) {
        List<CatalogEntry> entries = CatalogJson.read(json, source);
        Set<String> ids = new HashSet<>();
        for (CatalogEntry e : entries) {
            verify(e, source);
            if (!ids.add(e.id())) {
                throw new CatalogIntegrityException(source + ": id '" + e.id() + "' appears twice");
            }
        }
        return new Catalog(entries);
    }

    static void verify(CatalogEntry e, String source) {
        String at = source + " entry " + e.id();
        if (e.players() != e.dice().size() || e.players() != e.sides().size()) {
            throw new CatalogIntegrityException(at + ": players " + e.players() + " but "
                    + e.dice().size() + " dice and " + e.sides().size() + " side counts");
        }
        for (int d = 0; d < e.players(); d++) {
            if (e.dice().get(d).size() != e.sides().get(d)) {
                throw new CatalogIntegrityException(at + ": die " + (d + 1) + " has "
                        + e.dice().get(d).size() + " faces but sides says " + e.sides().get(d));
            }
        }
        DiceSet set;
        try {
            set = e.toDiceSet();
        } catch (InvalidDiceSetException ex) {
            throw new CatalogIntegrityException(at + ": not a valid set: " + ex.getMessage(), ex);
        }
        if (!set.equals(set.renumbered())) {
            throw new CatalogIntegrityException(at + ": faces are not in renumbered form 1.."
                    + set.totalFaces() + " with each die ascending");
        }
        String actual = set.sha256();
        if (!actual.equals(e.sha256())) {
            throw new CatalogIntegrityException(at + ": SHA-256 of the faces is " + actual
                    + " but the entry records " + e.sha256() + " (tampered or corrupted)");
        }
        if (e.subsetDepth() < 1 || e.subsetDepth() > e.players()) {
            throw new CatalogIntegrityException(at + ": subset depth " + e.subsetDepth()
                    + " is outside 1.." + e.players());
        }
    }

    /** Returns every entry, in catalog order. */
    public List<CatalogEntry> entries() {
        return entries;
    }

    /** Returns the entries for exactly {@code players} dice, in catalog order. */
    public List<CatalogEntry> entries(int players) {
        List<CatalogEntry> out = new ArrayList<>();
        for (CatalogEntry e : entries) {
            if (e.players() == players) {
                out.add(e);
            }
        }
        return out;
    }

    /**
     * Returns the best order-fair entry for exactly {@code players} dice: fewest total faces,
     * then fewest distinct side counts (equal dice preferred), then id.
     */
    public Optional<CatalogEntry> forPlayers(int players) {
        return entries.stream()
                .filter(e -> e.players() == players && e.grade() == FairnessGrade.ORDER_FAIR)
                .min(Comparator.comparingInt(CatalogEntry::totalFaces)
                        .thenComparingLong(e -> e.sides().stream().distinct().count())
                        .thenComparing(CatalogEntry::id));
    }

    /** Returns the entry with this id. */
    public Optional<CatalogEntry> byId(String id) {
        return entries.stream().filter(e -> e.id().equals(id)).findFirst();
    }
}
