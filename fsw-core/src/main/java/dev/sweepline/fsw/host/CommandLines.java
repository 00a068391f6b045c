package dev.sweepline.fsw.host;

import dev.sweepline.fsw.host.yaml.FileFormatException;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import java.util.Properties;
import picocli.CommandLine;

/**
 * What the command lines of {@code sweepline-fsw.jar} and {@code sweepline-bench.jar} share: every
 * error is one line on stderr naming the command, what and where, with an {@link ExitStatus}
 * (picocli's parameter- and execution-exception handlers); every command's help lists the statuses;
 * the version is the Maven build's.
 */
public final class CommandLines {
    private CommandLines() {
    }

    /**
     * Installs the one-line error handlers and the exit-status list on {@code cl} and its subcommands.
     *
     * @param hvCommands names of the subcommands that can end with {@link ExitStatus#HV_NOT_CONFIRMED}
     */
    public static CommandLine configure(CommandLine cl, String... hvCommands) {
        cl.setParameterExceptionHandler((e, args) -> {
            e.getCommandLine().getErr().println(name(e.getCommandLine()) + ": " + e.getMessage()
                    + " (see --help)");
            e.getCommandLine().getErr().flush();
            return ExitStatus.USAGE;
        });
        cl.setExecutionExceptionHandler((e, failed, parsed) -> {
            int status = statusOf(e);
            failed.getErr().println(name(failed) + ": " + lineOf(e));
            failed.getErr().flush();
            return status;
        });
        listStatuses(cl, java.util.Set.of(hvCommands));
        return cl;
    }

    private static void listStatuses(CommandLine cl, java.util.Set<String> hvCommands) {
        cl.getCommandSpec().usageMessage().exitCodeListHeading("Exit status:%n")
                .exitCodeList(ExitStatus.helpList(hvCommands.contains(cl.getCommandName())));
        cl.getSubcommands().values().forEach(sub -> listStatuses(sub, hvCommands));
    }

    private static String name(CommandLine cl) {
        return cl.getCommandSpec().qualifiedName();
    }

    /** The status of an exception that reached the handler. */
    static int statusOf(Exception e) {
        if (e instanceof CliException c) {
            return c.status();
        }
        if (e instanceof FileFormatException) {
            return ExitStatus.INPUT;
        }
        if (e instanceof IOException || e instanceof UncheckedIOException) {
            return ExitStatus.IO;
        }
        return ExitStatus.FAILED;
    }

    /** The one line an exception that reached the handler prints. */
    static String lineOf(Exception e) {
        if (e instanceof CliException || e instanceof FileFormatException) {
            return e.getMessage();
        }
        if (e instanceof UncheckedIOException u) {
            return (u.getMessage() == null ? "" : u.getMessage() + ": ") + located(u.getCause());
        }
        if (e instanceof IOException io) {
            return located(io);
        }
        return "unexpected error: " + e + (e.getCause() == null ? "" : " (" + e.getCause() + ")");
    }

    /** What went wrong opening a port, socket or file, in words (the exception's class is no help to a user). */
    public static String reason(Exception e) {
        if (e instanceof NoSuchFileException) {
            return "no such file or directory";
        }
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof FileAlreadyExistsException) {
            return "exists";
        }
        if (e instanceof FileSystemException f && f.getReason() != null) {
            return f.getReason();
        }
        return e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName();
    }

    /** The file an I/O exception names and {@link #reason}: "PATH: no such file or directory". */
    public static String located(Exception e) {
        String file = e instanceof FileSystemException f ? f.getFile() : null;
        return file == null ? reason(e) : file + ": " + reason(e);
    }

    /**
     * The project version of the Maven build, from the {@code version.properties} resource the build
     * filters beside {@code anchor}; "unknown" when the resource is absent (a build that skipped resources).
     */
    public static String version(Class<?> anchor) {
        try (InputStream in = anchor.getResourceAsStream("version.properties")) {
            if (in == null) {
                return "unknown";
            }
            Properties p = new Properties();
            p.load(in);
            return p.getProperty("version", "unknown");
        } catch (IOException e) {
            return "unknown";
        }
    }
}
