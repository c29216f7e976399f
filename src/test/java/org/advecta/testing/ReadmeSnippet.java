package org.advecta.testing;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Keeps README's code examples true: a test holds an example between the marker comments
 * {@code // --- README's example, verbatim ---} and {@code // --- end of the example}, runs
 * it, and calls {@link #assertShownInReadme} so that every code line of it must stand in
 * README.md as written.
 */
public final class ReadmeSnippet {

    private ReadmeSnippet() {
    }

    /**
     * Asserts that every non-blank, non-marker line between the markers of a test source stands
     * in README.md (compared after trimming).
     *
     * @param testSource the test's source file, relative to the project root
     * @param atLeast the smallest number of lines the example must have (guards the markers)
     * @throws IOException if a file cannot be read
     */
    public static void assertShownInReadme(String testSource, int atLeast) throws IOException {
        final String readme = Files.readString(Path.of("README.md"), StandardCharsets.UTF_8);
        final String source = Files.readString(Path.of(testSource), StandardCharsets.UTF_8);
        final int start = source.indexOf("// --- README's example");
        final int end = source.indexOf("// --- end of the example");
        assertTrue(start >= 0 && end > start, "no example markers in " + testSource);
        int checked = 0;
        for (String line : source.substring(start, end).split("\n")) {
            final String code = line.trim();
            if (code.isEmpty() || code.startsWith("// ---")) {
                continue;
            }
            checked++;
            assertTrue(readme.contains(code), "README no longer shows: " + code);
        }
        assertTrue(checked >= atLeast, "only " + checked + " lines checked in " + testSource);
    }
}
