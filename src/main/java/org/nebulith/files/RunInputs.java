package org.nebulith.files;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.DigestInputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;

import org.nebulith.errors.InputException;
import org.nebulith.errors.InternalException;
import org.nebulith.errors.Messages;

/**
 * The input files of one run, in the order they were registered, each with its SHA-256
 * checksum and size. Used twice: the report lists them (so a reader can check that the same
 * files were used), and every output path is checked against them so that a run never writes
 * onto, or replaces a folder holding, one of its own inputs.
 */
public final class RunInputs {

    /**
     * One input file.
     *
     * @param path   the path as the user gave it
     * @param role   what the file is for, e.g. {@code preset}, {@code feeding zones}
     * @param sha256 lower-case hex SHA-256 of the content
     * @param bytes  size [bytes]
     */
    public record InputFile(Path path, String role, String sha256, long bytes) {
    }

    private final List<InputFile> files = new ArrayList<>();
    private final List<InputFile> builtIn = new ArrayList<>();

    /**
     * Registers an input file, reading it once to compute its checksum. Registering the same
     * file twice keeps the first entry.
     *
     * @param file the file
     * @param role what it is for
     * @return this
     * @throws InputException if the file cannot be read
     */
    public synchronized RunInputs add(final Path file, final String role) {
        for (InputFile known : files) {
            if (PathIdentity.same(known.path(), file)) {
                return this;
            }
        }
        try {
            files.add(new InputFile(file, role, checkedSha256(file, file.toString()), Files.size(file)));
        } catch (IOException e) {
            throw new InputException(Messages.INPUT_NOT_READABLE, e, file, InputException.reason(e));
        }
        return this;
    }

    /**
     * Checks that a file is UTF-8 text without registering it (an earlier output read back, for
     * instance).
     *
     * @param file  the file
     * @param shown the file as named in a message
     * @throws InputException naming the file and line of the first byte that is not UTF-8
     */
    public static void checkText(final Path file, final String shown) {
        try {
            checkedSha256(file, shown);
        } catch (IOException e) {
            throw new InputException(Messages.INPUT_NOT_READABLE, e, shown, InputException.reason(e));
        }
    }

    /** Reads the file once: its SHA-256, and a check that it decodes as UTF-8, line by line. */
    private static String checkedSha256(final Path file, final String shown) throws IOException {
        MessageDigest digest = newDigest();
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer bytes = ByteBuffer.allocate(1 << 16);
        CharBuffer chars = CharBuffer.allocate(1 << 16);
        long line = 1;
        try (InputStream in = Files.newInputStream(file)) {
            boolean end = false;
            while (!end) {
                int n = in.read(bytes.array(), bytes.position(), bytes.remaining());
                end = n < 0;
                if (n > 0) {
                    digest.update(bytes.array(), bytes.position(), n);
                    bytes.position(bytes.position() + n);
                }
                bytes.flip();
                long asciiLines = asciiNewlines(bytes.array(), bytes.position(), bytes.limit());
                if (asciiLines >= 0) { // plain ASCII (the common case) needs no decoding
                    line += asciiLines;
                    bytes.position(bytes.limit());
                    bytes.compact();
                    continue;
                }
                int start = bytes.position();
                CoderResult result = decoder.decode(bytes, chars, end);
                line += newlines(bytes.array(), start, bytes.position());
                if (result.isError()) {
                    throw InputException.inFile(shown, "line " + line + ": byte 0x" + String.format("%02X",
                            bytes.get(bytes.position()) & 0xFF) + " is not UTF-8 text", "UTF-8 text (save the file as"
                            + " UTF-8; plain ASCII is UTF-8)");
                }
                chars.clear();
                bytes.compact();
            }
        }
        return HexFormat.of().formatHex(digest.digest());
    }

    /** @return the line ends in the range, or -1 if it holds a byte that is not ASCII */
    private static long asciiNewlines(final byte[] bytes, final int from, final int to) {
        long n = 0;
        for (int i = from; i < to; i++) {
            if (bytes[i] < 0) {
                return -1;
            }
            n += bytes[i] == '\n' ? 1 : 0;
        }
        return n;
    }

    private static long newlines(final byte[] bytes, final int from, final int to) {
        long n = 0;
        for (int i = from; i < to; i++) {
            n += bytes[i] == '\n' ? 1 : 0;
        }
        return n;
    }

    /**
     * Registers a copy shipped inside the program (a built-in preset): listed with its checksum,
     * never a file on disk, so no output can collide with it.
     *
     * @param shown   how the copy is named to users, e.g. {@code built-in presets/star-tessaly.csv}
     * @param role    what it is for
     * @param content its bytes
     * @return this
     */
    public synchronized RunInputs addBuiltIn(final String shown, final String role, final byte[] content) {
        Path label = Path.of(shown);
        if (files.stream().noneMatch(f -> f.path().equals(label))) {
            InputFile f = new InputFile(label, role, HexFormat.of().formatHex(newDigest().digest(content)), content.length);
            files.add(f);
            builtIn.add(f);
        }
        return this;
    }

    /** @return the registered files, in registration order */
    public synchronized List<InputFile> files() {
        return List.copyOf(files);
    }

    /**
     * Refuses an output path that is an input or (for a folder that will be replaced) contains one.
     *
     * @param output an output file or folder
     * @throws InputException naming the output and the input
     */
    public synchronized void checkNotInput(final Path output) {
        for (InputFile input : files) {
            if (builtIn.contains(input)) {
                continue;
            }
            if (PathIdentity.same(input.path(), output) || PathIdentity.contains(output, input.path())) {
                throw new InputException(Messages.OUTPUT_IS_INPUT, null, output, input.path());
            }
        }
    }

    /**
     * @param file a readable file
     * @return lower-case hex SHA-256 of its content
     * @throws IOException if it cannot be read
     */
    public static String sha256(final Path file) throws IOException {
        MessageDigest digest = newDigest();
        try (InputStream in = new DigestInputStream(Files.newInputStream(file), digest)) {
            in.transferTo(OutputStream.nullOutputStream());
        }
        return HexFormat.of().formatHex(digest.digest());
    }

    private static MessageDigest newDigest() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new InternalException("SHA-256 missing from the Java runtime", e);
        }
    }
}
