package org.riffle.demo;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The demo fixtures of the invented Kestrel Hill AF-2 scenario, generated deterministically: the
 * same bytes on every run and every Java 17+ virtual machine (integer arithmetic, {@link StrictMath},
 * {@link java.util.Random} with fixed seeds). Stateless; thread-safe.
 */
public final class Demo {
    private Demo() {
    }

    /** The fixture files by name, in the order they are written; a fresh map each call. */
    public static Map<String, byte[]> files() {
        Map<String, byte[]> files = new LinkedHashMap<>();
        files.put(ProcessLog.FILE, ProcessLog.bytes());
        files.put(VibrationRecording.FILE, VibrationRecording.bytes());
        files.put(DemoReadme.FILE, DemoReadme.bytes());
        return files;
    }

    /**
     * Writes the fixtures into {@code dir} (created when missing), each through a temporary file and a
     * rename so a reader never sees half a file.
     *
     * @return the files written
     * @throws IOException when the directory or a file cannot be written
     */
    public static List<Path> writeTo(Path dir) throws IOException {
        Files.createDirectories(dir);
        List<Path> written = new ArrayList<>();
        for (Map.Entry<String, byte[]> e : files().entrySet()) {
            Path target = dir.resolve(e.getKey());
            Path tmp = dir.resolve(e.getKey() + ".tmp");
            Files.write(tmp, e.getValue());
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            written.add(target);
        }
        return written;
    }
}
