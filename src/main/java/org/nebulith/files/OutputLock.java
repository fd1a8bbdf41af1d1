package org.nebulith.files;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;

/**
 * The one-writer lock of an output: a hidden sibling file {@code .NAME.lock}, created atomically
 * (create-new) and held with {@link FileChannel#tryLock()} for the whole run. It holds the owner's
 * process id, host, command and start time, so that a refused run can name the holder.
 *
 * <p>A second run finding the file asks the operating system whether the file lock is still held
 * (it is released when the owning process dies, however it dies). Held, or owned by a live process
 * of this host, or just being created: the run is refused, naming the holder. Not held and the
 * owner gone: the lock is stale; the run is refused too, naming the owner and the file to delete.
 * A stale lock is never taken over silently: the output it guards may be half-replaced.
 */
public final class OutputLock implements AutoCloseable {

    /** A lock file younger than this without content is taken as being created [ms]. */
    private static final long CREATION_GRACE_MS = 5_000;
    private static final Set<OutputLock> HELD = ConcurrentHashMap.newKeySet();

    static {
        Runtime.getRuntime().addShutdownHook(new Thread(OutputLock::releaseAll, "nebulith-lock-release"));
    }

    private final Path file;
    private final FileChannel channel;
    private final FileLock lock;

    private OutputLock(final Path file, final FileChannel channel, final FileLock lock) {
        this.file = file;
        this.channel = channel;
        this.lock = lock;
    }

    /**
     * @param output an output file or folder
     * @return its lock file, a hidden sibling
     */
    public static Path lockFile(final Path output) {
        Path absolute = output.toAbsolutePath().normalize();
        return absolute.resolveSibling("." + absolute.getFileName() + ".lock");
    }

    /**
     * Takes the lock of an output (the parent folder is created if needed).
     *
     * @param output  the output file or folder, as the user named it
     * @param command what is running, for the holder's description
     * @return the held lock; close it when the run is over
     * @throws InputException if another run holds it, or a stale lock is left
     */
    public static OutputLock acquire(final Path output, final String command) {
        Path file = lockFile(output);
        try {
            Files.createDirectories(file.getParent());
        } catch (IOException e) {
            throw new InputException(Messages.OUTPUT_UNUSABLE, e, output, "cannot create its parent folder ("
                    + e.getClass().getSimpleName() + ")", "a path in a writable folder");
        }
        FileChannel channel;
        try {
            channel = FileChannel.open(file, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE);
        } catch (FileAlreadyExistsException e) {
            throw refusal(output, file);
        } catch (IOException e) {
            throw new InputException(Messages.OUTPUT_UNUSABLE, e, output, "cannot create the lock file " + file + " ("
                    + e.getClass().getSimpleName() + ")", "a path in a writable folder");
        }
        return hold(output, file, channel, command);
    }

    private static OutputLock hold(final Path output, final Path file, final FileChannel channel, final String command) {
        try {
            FileLock lock = lockWithRetry(channel);
            channel.write(ByteBuffer.wrap(describeSelf(command).getBytes(StandardCharsets.UTF_8)));
            channel.force(true);
            OutputLock held = new OutputLock(file, channel, lock);
            HELD.add(held);
            return held;
        } catch (IOException | RuntimeException e) {
            closeQuietly(channel);
            deleteQuietly(file);
            if (e instanceof InputException) {
                throw (InputException) e;
            }
            throw new InputException(Messages.OUTPUT_UNUSABLE, e, output, "cannot lock " + file + " ("
                    + e.getClass().getSimpleName() + ")", "a folder on a file system that supports file locks");
        }
    }

    /** Another process may be probing the new file for a moment: retry briefly. */
    private static FileLock lockWithRetry(final FileChannel channel) throws IOException {
        for (int attempt = 0; attempt < 200; attempt++) {
            try {
                FileLock lock = channel.tryLock();
                if (lock != null) {
                    return lock;
                }
            } catch (OverlappingFileLockException e) {
                // a probe in this JVM holds it for a moment
            }
            try {
                Thread.sleep(5);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IOException("interrupted while locking", e);
            }
        }
        throw new IOException("the lock stayed busy");
    }

    private static InputException refusal(final Path output, final Path file) {
        Map<String, String> owner = readOwner(file);
        String holder = describe(owner);
        if (isHeld(file) || ownerAlive(owner) || beingCreated(file, owner)) {
            return new InputException(Messages.OUTPUT_LOCKED, null, output, holder + "; lock file " + file);
        }
        return new InputException(Messages.OUTPUT_LOCK_STALE, null, output, holder, file + leftovers(file, owner));
    }

    /** @return the hidden temporary folders the dead owner left beside the output, as " and ..." text */
    private static String leftovers(final Path lock, final Map<String, String> owner) {
        String name = lock.getFileName().toString();
        String prefix = name.substring(0, name.length() - ".lock".length()) + ".partial-" + owner.get("pid") + "-";
        try (var siblings = Files.list(lock.getParent())) {
            StringBuilder text = new StringBuilder();
            siblings.filter(p -> p.getFileName().toString().startsWith(prefix)).sorted().limit(3)
                    .forEach(p -> text.append(" and ").append(p));
            return text.toString();
        } catch (IOException | UncheckedIOException e) {
            return "";
        }
    }

    /** @return whether some process (this one included) holds the file lock */
    private static boolean isHeld(final Path file) {
        try (FileChannel probe = FileChannel.open(file, StandardOpenOption.WRITE)) {
            FileLock lock = probe.tryLock();
            if (lock == null) {
                return true;
            }
            lock.release();
            return false;
        } catch (OverlappingFileLockException e) {
            return true;
        } catch (IOException e) {
            return true;
        }
    }

    private static boolean ownerAlive(final Map<String, String> owner) {
        if (!host().equals(owner.get("host"))) {
            return owner.containsKey("host"); // another host: cannot tell, so take it as alive
        }
        try {
            long pid = Long.parseLong(owner.getOrDefault("pid", ""));
            return ProcessHandle.of(pid).map(ProcessHandle::isAlive).orElse(false);
        } catch (NumberFormatException e) {
            return false;
        }
    }

    private static boolean beingCreated(final Path file, final Map<String, String> owner) {
        if (!owner.isEmpty()) {
            return false;
        }
        try {
            long age = System.currentTimeMillis() - Files.getLastModifiedTime(file).toMillis();
            return age < CREATION_GRACE_MS;
        } catch (IOException e) {
            return false;
        }
    }

    private static Map<String, String> readOwner(final Path file) {
        Map<String, String> owner = new LinkedHashMap<>();
        try {
            for (String line : Files.readAllLines(file, StandardCharsets.UTF_8)) {
                int eq = line.indexOf('=');
                if (eq > 0) {
                    owner.put(line.substring(0, eq).strip(), Messages.echo(line.substring(eq + 1).strip()));
                }
            }
        } catch (IOException | UncheckedIOException e) {
            owner.clear();
        }
        return owner;
    }

    private static String describe(final Map<String, String> owner) {
        if (!owner.containsKey("pid")) {
            return "a run whose lock file names no owner";
        }
        return "process " + owner.get("pid") + " on host " + owner.getOrDefault("host", "?") + ", nebulith "
                + owner.getOrDefault("command", "?") + " started " + owner.getOrDefault("started", "?");
    }

    private static String describeSelf(final String command) {
        return "pid=" + ProcessHandle.current().pid() + "\nhost=" + host() + "\ncommand=" + command + "\nstarted="
                + Instant.now() + "\n";
    }

    /** @return this machine's host name, without a network look-up */
    static String host() {
        String name = System.getenv("HOSTNAME");
        if (name != null && !name.isBlank()) {
            return name.strip();
        }
        try {
            Path kernel = Path.of("/proc/sys/kernel/hostname");
            if (Files.isReadable(kernel)) {
                return Files.readString(kernel, StandardCharsets.UTF_8).strip();
            }
        } catch (IOException e) {
            // fall through
        }
        return Optional.ofNullable(System.getenv("COMPUTERNAME")).orElse("localhost");
    }

    /** @return the lock file */
    public Path file() {
        return file;
    }

    /** Deletes the lock file and releases the lock (idempotent). */
    @Override
    public void close() {
        if (HELD.remove(this)) {
            deleteQuietly(file);
            try {
                lock.release();
            } catch (IOException e) {
                // closing the channel releases it anyway
            }
            closeQuietly(channel);
        }
    }

    /** Releases every lock of this JVM (shutdown hook; a stopped run's temporary folder may still be being deleted). */
    static void releaseAll() {
        for (OutputLock held : Set.copyOf(HELD)) {
            held.close();
        }
    }

    private static void closeQuietly(final FileChannel channel) {
        try {
            channel.close();
        } catch (IOException e) {
            // best effort
        }
    }

    private static void deleteQuietly(final Path file) {
        try {
            Files.deleteIfExists(file);
        } catch (IOException e) {
            // best effort
        }
    }
}
