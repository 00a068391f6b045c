package dev.sweepline.fsw.host.yaml;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Built-in input files shipped on the classpath under one folder and listed by its {@code index.txt}
 * (a jar cannot list a folder): one name a line, {@code #} starts a comment. A built-in name wins over
 * a file of the same name in the working directory ({@code ./name} names the file).
 *
 * @param folder the resource folder, e.g. {@code instruments/}
 * @param what   what the files are, for messages ("instrument", "scenario")
 */
public record BuiltIns(String folder, String what) {
    /** The names of the built-ins, in index order. */
    public List<String> names() {
        List<String> names = new ArrayList<>();
        for (String line : resource(folder + "index.txt").split("\n")) {
            int hash = line.indexOf('#');
            String name = (hash < 0 ? line : line.substring(0, hash)).strip();
            if (!name.isEmpty()) {
                names.add(name);
            }
        }
        return List.copyOf(names);
    }

    /** The resource name of built-in {@code name}: {@code folder + name + ".yaml"}. */
    public String resourceOf(String name) {
        return folder + name + ".yaml";
    }

    /**
     * The text of a resource of this folder's class loader.
     *
     * @throws FileFormatException when the build lacks it
     */
    public String resource(String resource) {
        try (InputStream in = BuiltIns.class.getClassLoader().getResourceAsStream(resource)) {
            if (in == null) {
                throw new FileFormatException(resource, 0, "", "built-in resource missing from the build");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * The text of the file at {@code path}.
     *
     * @throws FileFormatException when it does not exist or cannot be read
     */
    public static String file(Path path) {
        if (Files.isDirectory(path)) {
            throw new FileFormatException(path.toString(), 0, "", "is a folder, not a file");
        }
        try {
            return Files.readString(path, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new FileFormatException(path.toString(), 0, "", "no such file", e);
        } catch (IOException e) {
            throw new FileFormatException(path.toString(), 0, "", "cannot read: " + e, e);
        }
    }

    /** The error for a name that is neither a built-in nor a file: it lists the built-ins. */
    public FileFormatException unknown(String name) {
        if (Files.isDirectory(Path.of(name))) {
            return new FileFormatException(name, 0, "", "is a folder, not a " + what + " file (nor a built-in "
                    + what + "; built-ins: " + String.join(", ", names()) + ")");
        }
        return new FileFormatException(name, 0, "", "no built-in " + what + " of that name and no such file; built-ins: "
                + String.join(", ", names()));
    }
}
