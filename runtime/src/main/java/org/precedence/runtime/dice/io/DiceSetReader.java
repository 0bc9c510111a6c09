package org.precedence.runtime.dice.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.precedence.runtime.dice.DiceSet;

/**
 * Reads a dice set in either written form. Every failure is a {@link SetFormatException} with
 * a one-line message that starts with the line and column of the problem.
 */
public final class DiceSetReader {
    /** Largest input accepted; far beyond any listed set (the largest useful ones are ~1 MB). */
    public static final int MAX_BYTES = 64 << 20;

    private DiceSetReader() {
    }

    /** Reads {@code text}, detecting the form ({@link DiceSetFormat#detect}). */
    public static DiceSet read(String text) {
        return read(text, DiceSetFormat.detect(text));
    }

    /** Reads {@code text} in the given form. */
    public static DiceSet read(String text, DiceSetFormat format) {
        return switch (format) {
            case JSON -> JsonSetFormat.read(text);
            case TEXT -> TextSetFormat.read(text);
        };
    }

    /**
     * Reads UTF-8 from {@code in} (not closed), in the given form or detected when null.
     *
     * @throws SetFormatException for malformed UTF-8, oversized input or a malformed set
     * @throws IOException        when reading fails
     */
    public static DiceSet read(InputStream in, DiceSetFormat format) throws IOException {
        byte[] bytes = in.readNBytes(MAX_BYTES + 1);
        if (bytes.length > MAX_BYTES) {
            throw new SetFormatException("input larger than " + (MAX_BYTES >> 20) + " MiB");
        }
        String text = decode(bytes);
        return format == null ? read(text) : read(text, format);
    }

    /** Reads the file at {@code path}, in the given form or detected when null. */
    public static DiceSet read(Path path, DiceSetFormat format) throws IOException {
        try (InputStream in = Files.newInputStream(path)) {
            return read(in, format);
        }
    }

    private static String decode(byte[] bytes) {
        try {
            return StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            throw new SetFormatException("the input is not valid UTF-8 text");
        }
    }
}
