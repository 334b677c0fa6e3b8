package org.tracewell.core.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Random;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.IntStream;

import org.junit.jupiter.api.Test;
import org.tracewell.core.Examples;
import org.tracewell.core.validation.ModelValidation;

/**
 * 10⁴ randomly mutated example files: loading never throws anything but {@link ModelLoadException}, never hangs,
 * and a file that is refused always says where and why. Seeded, so a failure reproduces.
 */
class MutationFuzzTest {

    /** At least 10⁴ (issue 5); {@code -Dtracewell.fuzz.mutants=N} raises it for a longer soak. */
    private static final int MUTANTS = Math.max(10_000, Integer.getInteger("tracewell.fuzz.mutants", 10_000));
    private static final long SEED = 20_260_301L;
    private static final String ALPHABET = "<>/=\"'&;#:!?- abcxyzAXY0123456789.E\n";

    @Test
    void mutatedFilesGiveAModelOrDiagnosticsNeverACrash() throws Exception {
        Path[] bases = {Examples.file(Examples.SHARED_Z), Examples.file("library/a-trunnion-i100.axis"),
                Examples.file(Examples.LM_3020)};
        byte[][] contents = new byte[bases.length][];
        for (int i = 0; i < bases.length; i++) {
            contents[i] = Files.readAllBytes(bases[i]);
        }
        ModelFiles files = new ModelFiles();
        AtomicInteger loaded = new AtomicInteger();
        AtomicInteger refused = new AtomicInteger();
        // Each mutant has its own seed, so any one of them reproduces alone; mutants run in parallel.
        assertTimeoutPreemptively(Duration.ofSeconds(120), () -> IntStream.range(0, MUTANTS).parallel().forEach(n -> {
            // Mostly the small axis files, every tenth mutant the whole machine with its library reference.
            int base = n % 10 == 9 ? 2 : n % 2;
            byte[] mutant = mutate(contents[base], new Random(SEED + n));
            try {
                LoadedModel model = files.load(mutant, bases[base]);
                assertNotNull(new ModelValidation().validate(model.root()));
                loaded.incrementAndGet();
            } catch (ModelLoadException e) {
                assertFalse(e.problems().isEmpty());
                e.problems().forEach(p -> {
                    assertNotNull(p.position().file(), "problem without file");
                    assertTrue(p.message() != null && !p.message().isBlank(), "problem without message");
                });
                refused.incrementAndGet();
            } catch (RuntimeException | AssertionError escaped) {
                throw new AssertionError("mutant " + n + " (seed " + (SEED + n) + ") escaped:\n"
                        + new String(mutant, StandardCharsets.UTF_8), escaped);
            }
        }));
        assertTrue(loaded.get() > 0 && refused.get() > 0, "both outcomes occur: loaded " + loaded + ", refused "
                + refused);
        assertEquals(MUTANTS, loaded.get() + refused.get());
    }

    private static byte[] mutate(byte[] original, Random random) {
        byte[] bytes = original.clone();
        int edits = 1 + random.nextInt(3);
        for (int e = 0; e < edits; e++) {
            int at = random.nextInt(bytes.length);
            switch (random.nextInt(6)) {
                case 0 -> bytes[at] = (byte) ALPHABET.charAt(random.nextInt(ALPHABET.length()));
                case 1 -> bytes = splice(bytes, at, Math.min(bytes.length, at + 1 + random.nextInt(40)), new byte[0]);
                case 2 -> {
                    int from = random.nextInt(bytes.length);
                    int to = Math.min(bytes.length, from + 1 + random.nextInt(120));
                    bytes = splice(bytes, at, at, java.util.Arrays.copyOfRange(bytes, from, to));
                }
                case 3 -> bytes = java.util.Arrays.copyOf(bytes, Math.max(1, at));
                case 4 -> {
                    // Replace the digits of a number: the usual way a value goes wrong.
                    byte[] number = String.valueOf(switch (random.nextInt(4)) {
                        case 0 -> -random.nextDouble();
                        case 1 -> Double.NaN;
                        case 2 -> 0.0;
                        default -> random.nextDouble() * 1e9;
                    }).getBytes(StandardCharsets.UTF_8);
                    int digit = indexOfDigit(bytes, at);
                    if (digit >= 0) {
                        int end = digit;
                        while (end < bytes.length && (Character.isDigit(bytes[end]) || bytes[end] == '.'
                                || bytes[end] == 'E' || bytes[end] == '-')) {
                            end++;
                        }
                        bytes = splice(bytes, digit, end, number);
                    }
                }
                default -> {
                    byte[] junk = new byte[1 + random.nextInt(8)];
                    random.nextBytes(junk);
                    bytes = splice(bytes, at, at, junk);
                }
            }
        }
        return bytes;
    }

    private static int indexOfDigit(byte[] bytes, int from) {
        for (int i = from; i < bytes.length; i++) {
            if (Character.isDigit(bytes[i])) {
                return i;
            }
        }
        return -1;
    }

    private static byte[] splice(byte[] bytes, int from, int to, byte[] insert) {
        byte[] result = new byte[bytes.length - (to - from) + insert.length];
        System.arraycopy(bytes, 0, result, 0, from);
        System.arraycopy(insert, 0, result, from, insert.length);
        System.arraycopy(bytes, to, result, from + insert.length, bytes.length - to);
        return result;
    }
}
