package dev.changeling.compile;

import java.util.ArrayList;
import java.util.List;
import org.objectweb.asm.Opcodes;
import org.objectweb.asm.tree.AbstractInsnNode;
import org.objectweb.asm.tree.InsnList;
import org.objectweb.asm.tree.JumpInsnNode;
import org.objectweb.asm.tree.LookupSwitchInsnNode;
import org.objectweb.asm.tree.MethodNode;
import org.objectweb.asm.tree.TableSwitchInsnNode;
import org.objectweb.asm.tree.TryCatchBlockNode;

/** Where control may go after each instruction of a method: the next one, jump and switch targets, covering handlers. */
final class ControlFlow {

    private ControlFlow() {
    }

    /** The successors of each instruction, by index into the method's instruction list. */
    static List<List<Integer>> successors(MethodNode method) {
        List<List<Integer>> all = new ArrayList<>();
        for (int index = 0; index < method.instructions.size(); index++) {
            all.add(successors(method, index));
        }
        return all;
    }

    private static List<Integer> successors(MethodNode method, int index) {
        InsnList code = method.instructions;
        AbstractInsnNode instruction = code.get(index);
        List<Integer> next = new ArrayList<>();
        if (instruction instanceof JumpInsnNode jump) {
            next.add(code.indexOf(jump.label));
        } else if (instruction instanceof TableSwitchInsnNode table) {
            next.add(code.indexOf(table.dflt));
            table.labels.forEach(label -> next.add(code.indexOf(label)));
        } else if (instruction instanceof LookupSwitchInsnNode lookup) {
            next.add(code.indexOf(lookup.dflt));
            lookup.labels.forEach(label -> next.add(code.indexOf(label)));
        }
        if (fallsThrough(instruction.getOpcode()) && index + 1 < code.size()) {
            next.add(index + 1);
        }
        for (TryCatchBlockNode handler : method.tryCatchBlocks) {
            if (code.indexOf(handler.start) <= index && index < code.indexOf(handler.end)) {
                next.add(code.indexOf(handler.handler));
            }
        }
        return next;
    }

    private static boolean fallsThrough(int opcode) {
        return switch (opcode) {
            case Opcodes.GOTO, Opcodes.TABLESWITCH, Opcodes.LOOKUPSWITCH, Opcodes.ATHROW, Opcodes.RET,
                 Opcodes.IRETURN, Opcodes.LRETURN, Opcodes.FRETURN, Opcodes.DRETURN, Opcodes.ARETURN, Opcodes.RETURN -> false;
            default -> true;
        };
    }
}
