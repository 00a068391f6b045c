package dev.sweepline.fsw.nvm;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.command.NonVolatileStore;
import dev.sweepline.fsw.command.TableManager;
import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.link.InstrumentLink;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.sweep.SweepListener;
import dev.sweepline.fsw.telemetry.Apid;
import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The PC's non-volatile memory: durable writes (POSIX fsync(2) of the data before rename(2), then of
 * the directory, so the rename itself survives a power loss), an empty file reported as a torn
 * write rather than "nothing stored", stale temporary files removed at start-up.
 */
class FileNonVolatileStoreTest {
    @TempDir
    Path dir;

    private static final InstrumentLink IDLE = new InstrumentLink() {
        @Override
        public boolean send(StepCommand step, long nowMicros) {
            return true;
        }

        @Override
        public boolean poll(SampleReply into, long nowMicros) {
            return false;
        }
    };

    @Test
    void shouldForceTheDataBeforeTheRenameAndTheDirectoryAfterIt() throws IOException {
        Path file = dir.resolve("nvm.bin");
        Files.write(file, new byte[] {9, 9});
        List<String> order = new ArrayList<>();
        FileNonVolatileStore store = new FileNonVolatileStore(file, new FileNonVolatileStore.Durability() {
            @Override
            public void forceFile(FileChannel channel) throws IOException {
                order.add("file:" + channel.size() + ":old=" + Files.readAllBytes(file).length);
            }

            @Override
            public void forceDirectory(Path directory) {
                order.add("dir:" + directory.getFileName() + ":new=" + sizeOf(file));
            }
        });
        assertEquals(NonVolatileStore.OK, store.write(NonVolatileStore.RECORD_TABLE, new byte[] {1, 2, 3}, 3));
        assertEquals(List.of("file:3:old=2", "dir:" + dir.getFileName() + ":new=3"), order);
        assertFalse(Files.exists(dir.resolve("nvm.bin.tmp")));
    }

    @Test
    void shouldReadAnEmptyFileAsATornWriteAndReportItLikeACorruptImage() throws IOException {
        Path file = dir.resolve("nvm.bin");
        Files.write(file, new byte[0]);
        FileNonVolatileStore store = new FileNonVolatileStore(file);
        assertEquals(NonVolatileStore.EMPTY, store.read(NonVolatileStore.RECORD_TABLE, new byte[64]));
        FlightConfig c = DemoCup.config();
        c.nonVolatileStore = store;
        FlightSoftware fsw = new FlightSoftware(c, IDLE, (f, off, len) -> { }, SweepListener.NONE);
        assertEquals(TableManager.RESTORE_REJECTED, fsw.restoreStatus());
        assertTrue(fsw.telemetry().counters().packets(Apid.EVENT) >= 1, "the restore event is sent");
    }

    @Test
    void shouldRemoveStaleTemporaryFilesAtStartUp() throws IOException {
        Path file = dir.resolve("nvm.bin");
        Files.write(dir.resolve("nvm.bin.tmp"), new byte[] {1});
        Files.write(dir.resolve("nvm.bin.auth.tmp"), new byte[] {1});
        Files.write(dir.resolve("nvm.bin8372651.tmp"), new byte[] {1}); // the name an older version used
        Files.write(dir.resolve("other.tmp"), new byte[] {1});
        FileNonVolatileStore store = new FileNonVolatileStore(file);
        assertEquals(3, store.staleTemporariesRemoved());
        assertTrue(Files.exists(dir.resolve("other.tmp")), "only this store's files");
    }

    @Test
    void shouldKeepEachRecordInItsOwnFile() {
        FileNonVolatileStore store = new FileNonVolatileStore(dir.resolve("nvm.bin"));
        assertEquals(NonVolatileStore.ABSENT, store.read(NonVolatileStore.RECORD_AUTH, new byte[16]));
        store.write(NonVolatileStore.RECORD_AUTH, new byte[] {7, 8}, 2);
        store.write(NonVolatileStore.RECORD_TABLE, new byte[] {1}, 1);
        byte[] back = new byte[16];
        assertEquals(2, store.read(NonVolatileStore.RECORD_AUTH, back));
        assertArrayEquals(new byte[] {7, 8}, java.util.Arrays.copyOf(back, 2));
        assertTrue(Files.exists(dir.resolve("nvm.bin.auth")));
    }

    private static long sizeOf(Path p) {
        try {
            return Files.size(p);
        } catch (IOException e) {
            return -1;
        }
    }
}
