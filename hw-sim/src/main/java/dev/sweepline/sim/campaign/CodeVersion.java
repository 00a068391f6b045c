package dev.sweepline.sim.campaign;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Enumeration;
import java.util.HexFormat;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.TreeMap;
import java.util.jar.JarEntry;
import java.util.jar.JarFile;
import java.util.stream.Stream;

/**
 * The version of the code a campaign ran on, as written into each shard's {@link CampaignIdentity}: the
 * project version and the first 16 hex digits of a SHA-256 over the content of the code and data the given
 * classes were loaded from (a jar's entries or a class folder's files, by name): the project's own classes
 * and files ({@code dev/sweepline/}), its built-in data ({@link #DATA}: the top folders of the modules'
 * {@code src/main/resources}, which {@code ShardSetTest} keeps in step) and the libraries' versions
 * ({@code META-INF/maven/.../pom.properties}); not the rest of {@code META-INF/}, so a build's time stamps do
 * not count, and not the libraries' own classes and files, which their versions stand for (hashing the whole
 * jar took 2-3 s). Two runs agree on it when they ran the same code, data and library versions.
 */
public final class CodeVersion {
    private static final int DIGITS = 16;
    /** The built-in data folders of the jar: fsw-core's instruments, hw-sim's campaigns, plans and scenarios. */
    static final List<String> DATA = List.of("campaigns/", "instruments/", "plans/", "scenarios/");

    private CodeVersion() {
    }

    /** {@code projectVersion+hash} over the code sources of {@code anchors} (each counted once). */
    public static String of(String projectVersion, Class<?>... anchors) {
        Set<Path> sources = new LinkedHashSet<>();
        for (Class<?> c : anchors) {
            try {
                sources.add(Path.of(c.getProtectionDomain().getCodeSource().getLocation().toURI()));
            } catch (URISyntaxException | NullPointerException e) {
                throw new IllegalStateException("cannot locate the code of " + c.getName(), e);
            }
        }
        return ofSources(projectVersion, sources);
    }

    /** {@code projectVersion+hash} over {@code sources}, each a jar file or a class folder. */
    static String ofSources(String projectVersion, Collection<Path> sources) {
        MessageDigest sha = sha256();
        try {
            for (Path source : sources) {
                if (Files.isDirectory(source)) {
                    folder(source, sha);
                } else {
                    jar(source, sha);
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException("reading the code to version it: " + e.getMessage(), e);
        }
        return projectVersion + "+" + HexFormat.of().formatHex(sha.digest()).substring(0, DIGITS);
    }

    private static void jar(Path file, MessageDigest sha) throws IOException {
        try (JarFile jar = new JarFile(file.toFile())) {
            TreeMap<String, JarEntry> entries = new TreeMap<>();
            for (Enumeration<JarEntry> e = jar.entries(); e.hasMoreElements(); ) {
                JarEntry entry = e.nextElement();
                if (!entry.isDirectory() && counts(entry.getName())) {
                    entries.put(entry.getName(), entry);
                }
            }
            for (JarEntry entry : entries.values()) {
                try (InputStream in = jar.getInputStream(entry)) {
                    add(sha, entry.getName(), in.readAllBytes());
                }
            }
        }
    }

    private static void folder(Path root, MessageDigest sha) throws IOException {
        List<Path> files = new ArrayList<>();
        try (Stream<Path> walk = Files.walk(root)) {
            walk.filter(Files::isRegularFile).forEach(files::add);
        }
        TreeMap<String, Path> byName = new TreeMap<>();
        for (Path f : files) {
            String name = root.relativize(f).toString().replace('\\', '/');
            if (counts(name)) {
                byName.put(name, f);
            }
        }
        for (var e : byName.entrySet()) {
            add(sha, e.getKey(), Files.readAllBytes(e.getValue()));
        }
    }

    /** True for the entries the version covers (the class comment). */
    static boolean counts(String name) {
        if (name.startsWith("META-INF/")) {
            return name.startsWith("META-INF/maven/") && name.endsWith("/pom.properties");
        }
        return name.startsWith("dev/sweepline/") || DATA.stream().anyMatch(name::startsWith);
    }

    private static void add(MessageDigest sha, String name, byte[] content) {
        sha.update(name.getBytes(StandardCharsets.UTF_8));
        sha.update((byte) 0);
        sha.update(Long.toString(content.length).getBytes(StandardCharsets.US_ASCII));
        sha.update((byte) 0);
        sha.update(content);
    }

    static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform (MessageDigest)", e);
        }
    }
}
