package org.littoral.validation;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * docs/references.md lists every published source the code and docs cite: each "Author (year)", "Author et al.
 * year" or "Author &amp; Other year" found in the sources, tests, scenario files and documents must have an entry
 * line in it with the same surname and year. A new citation without an entry fails here with the list to add.
 */
class ReferencesListTest {
    private static final Pattern CITATION = Pattern.compile(
            "\\b((?:van der |van |de |Van )?[A-Z][a-zA-Z\\-]+)(?:'s)?(?: et al\\.|,? (?:&amp;|&|and) (?:van |de )?[A-Z][a-zA-Z'\\-]+)?,? \\(?((?:18|19|20)\\d\\d)\\b");
    /** Capitalised words that precede a year without being an author. */
    private static final Set<String> NOT_AUTHORS = Set.of("January", "February", "March", "April", "May", "June", "July", "August",
            "September", "October", "November", "December", "Measured", "Observed", "NX", "Since", "Copyright");

    static Path repositoryRoot() {
        Path p = Path.of("").toAbsolutePath();
        while (p != null && !Files.isRegularFile(p.resolve("docs/references.md"))) {
            p = p.getParent();
        }
        return p;
    }

    @Test
    void everyCitedAuthorAndYearHasAnEntryInDocsReferences() throws IOException {
        Path root = repositoryRoot();
        assertTrue(root != null, "docs/references.md not found above " + Path.of("").toAbsolutePath());
        List<String> entries = Files.readAllLines(root.resolve("docs/references.md"));
        Set<String> missing = new TreeSet<>();
        for (String top : new String[] {"model", "scenarios", "validation", "docs", "demo-data", "README.md", "DEVELOPERS.md"}) {
            Path start = root.resolve(top);
            if (!Files.exists(start)) {
                continue;
            }
            try (Stream<Path> files = Files.walk(start)) {
                for (Path f : files.filter(ReferencesListTest::cited).toList()) {
                    Matcher m = CITATION.matcher(Files.readString(f));
                    while (m.find()) {
                        String[] words = m.group(1).split(" ");
                        String name = words[words.length - 1];
                        String year = m.group(2);
                        if (NOT_AUTHORS.contains(name)) {
                            continue;
                        }
                        if (entries.stream().noneMatch(l -> l.contains(name) && l.contains(year))) {
                            missing.add(name + " " + year + " (" + root.relativize(f) + ")");
                        }
                    }
                }
            }
        }
        assertTrue(missing.isEmpty(), "cited but not in docs/references.md (add an entry with the full reference): " + missing);
    }

    private static boolean cited(Path f) {
        String s = f.toString();
        return Files.isRegularFile(f) && !s.contains("/target/") && !s.endsWith("docs/references.md")
                && (s.endsWith(".java") || s.endsWith(".md") || s.endsWith(".yaml"));
    }
}
