package org.finstack.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/** Reads a user's text file (UTF-8), turning every failure into one sentence naming the file. */
public final class TextFiles {

    private TextFiles() {
    }

    /**
     * @param file the file
     * @return its text
     * @throws InputException naming the file and the reason
     */
    public static String read(Path file) {
        try {
            return Files.readString(file, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new InputException(file.toString(), Msg.FILE_UNREADABLE, file, "no such file");
        } catch (IOException e) {
            throw new InputException(file.toString(), Msg.FILE_UNREADABLE, file, e.getMessage());
        }
    }
}
