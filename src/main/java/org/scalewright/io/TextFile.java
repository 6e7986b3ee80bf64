package org.scalewright.io;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;

/** Reads a UTF-8 text file into lines, refusing files that are not text. */
final class TextFile {
    private TextFile() {
    }

    static List<String> lines(Path file) throws BadInputException {
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw BadInputException.of(file, "no such file");
        } catch (IOException e) {
            throw BadInputException.of(file, "cannot be read: " + e.getMessage());
        }
        return lines(file, bytes);
    }

    static List<String> lines(Path file, byte[] bytes) throws BadInputException {
        for (byte b : bytes) {
            if (b == 0) {
                throw BadInputException.of(file, "is not a text file (it holds binary data); expected a UTF-8 CSV file");
            }
        }
        String text;
        try {
            text = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            throw BadInputException.of(file, "is not UTF-8 text; save it as a UTF-8 CSV file");
        }
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1);
        }
        return text.lines().toList();
    }
}
