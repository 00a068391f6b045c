package dev.sweepline.fsw;

import com.tngtech.archunit.thirdparty.org.objectweb.asm.ClassReader;
import com.tngtech.archunit.thirdparty.org.objectweb.asm.ClassVisitor;
import com.tngtech.archunit.thirdparty.org.objectweb.asm.MethodVisitor;
import com.tngtech.archunit.thirdparty.org.objectweb.asm.Opcodes;
import dev.sweepline.fsw.sweep.SweepScheduler;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Integer arithmetic in the scheduler and the executive (architecture.md, determinism): no float or
 * double instruction in any production class of the core packages, read from the bytecode with the
 * ASM copy that ArchUnit ships. The one allowed user is the start-up table factory
 * {@code WindowTable.logSpaced} (issue 2: floating point allowed there, start-up only).
 */
class NoFloatingPointTest {
    private static final Set<String> ALLOWED = Set.of("dev/sweepline/fsw/table/WindowTable#logSpaced");
    private static final Set<Integer> FLOAT_OPS = Set.of(
        Opcodes.FCONST_0, Opcodes.FCONST_1, Opcodes.FCONST_2, Opcodes.DCONST_0, Opcodes.DCONST_1,
        Opcodes.FLOAD, Opcodes.DLOAD, Opcodes.FSTORE, Opcodes.DSTORE, Opcodes.FALOAD, Opcodes.DALOAD,
        Opcodes.FASTORE, Opcodes.DASTORE, Opcodes.FADD, Opcodes.DADD, Opcodes.FSUB, Opcodes.DSUB,
        Opcodes.FMUL, Opcodes.DMUL, Opcodes.FDIV, Opcodes.DDIV, Opcodes.FREM, Opcodes.DREM, Opcodes.FNEG,
        Opcodes.DNEG, Opcodes.I2F, Opcodes.I2D, Opcodes.L2F, Opcodes.L2D, Opcodes.F2I, Opcodes.F2L,
        Opcodes.F2D, Opcodes.D2I, Opcodes.D2L, Opcodes.D2F, Opcodes.FCMPL, Opcodes.FCMPG, Opcodes.DCMPL,
        Opcodes.DCMPG, Opcodes.FRETURN, Opcodes.DRETURN);

    @Test
    void shouldUseNoFloatingPointOutsideStartUpFactory() throws Exception {
        Path root = Paths.get(SweepScheduler.class.getProtectionDomain().getCodeSource().getLocation().toURI());
        List<String> offenders = new ArrayList<>();
        List<String> allowedSeen = new ArrayList<>();
        int scanned = 0;
        try (Stream<Path> files = Files.walk(root.resolve("dev/sweepline/fsw"))) {
            for (Path p : (Iterable<Path>) files::iterator) {
                String rel = root.relativize(p).toString().replace('\\', '/');
                if (!rel.endsWith(".class") || rel.startsWith("dev/sweepline/fsw/host/")) {
                    continue;
                }
                scanned++;
                scan(p, offenders, allowedSeen);
            }
        }
        assertTrue(scanned > 10, "scanned " + scanned);
        assertEquals(List.of(), offenders);
        // the scan sees floating point where it is: the start-up factory does use it
        assertTrue(allowedSeen.contains("dev/sweepline/fsw/table/WindowTable#logSpaced"));
    }

    private static void scan(Path classFile, List<String> offenders, List<String> allowedSeen) throws IOException {
        try (InputStream in = Files.newInputStream(classFile)) {
            new ClassReader(in).accept(new ClassVisitor(Opcodes.ASM9) {
                private String owner;

                @Override
                public void visit(int version, int access, String name, String sig, String superName, String[] ifs) {
                    owner = name;
                }

                @Override
                public MethodVisitor visitMethod(int access, String name, String desc, String sig, String[] ex) {
                    String where = owner + "#" + name;
                    return new MethodVisitor(Opcodes.ASM9) {
                        private void flag(String what) {
                            if (ALLOWED.contains(where)) {
                                if (!allowedSeen.contains(where)) {
                                    allowedSeen.add(where);
                                }
                            } else {
                                offenders.add(where + " " + what);
                            }
                        }

                        @Override
                        public void visitInsn(int opcode) {
                            if (FLOAT_OPS.contains(opcode)) {
                                flag("opcode " + opcode);
                            }
                        }

                        @Override
                        public void visitVarInsn(int opcode, int var) {
                            if (FLOAT_OPS.contains(opcode)) {
                                flag("opcode " + opcode);
                            }
                        }

                        @Override
                        public void visitLdcInsn(Object value) {
                            if (value instanceof Float || value instanceof Double) {
                                flag("constant " + value);
                            }
                        }
                    };
                }
            }, 0);
        }
    }
}
