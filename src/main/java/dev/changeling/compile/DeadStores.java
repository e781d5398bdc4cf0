package dev.changeling.compile;

import java.util.Arrays;
import java.util.BitSet;
import java.util.List;
import org.objectweb.asm.Opcodes;
import org.objectweb.asm.tree.AbstractInsnNode;
import org.objectweb.asm.tree.IincInsnNode;
import org.objectweb.asm.tree.InsnList;
import org.objectweb.asm.tree.MethodNode;
import org.objectweb.asm.tree.VarInsnNode;

/**
 * Stores to local variables whose value no later load reads (found by the textbook backward liveness analysis over
 * the method's control flow, a handler counting as a successor of every instruction it covers, and an increment
 * passing a variable's liveness through, since it only ever feeds the variable itself). Such a store keeps only its
 * value's computation: it reads as a pop, and a constant or a variable pushed just for it goes too; an increment of
 * such a variable goes.
 */
final class DeadStores {

    /** What becomes of one instruction. */
    enum Edit { KEEP, DROP, POP, POP2 }

    private DeadStores() {
    }

    static Edit[] edits(MethodNode method) {
        InsnList code = method.instructions;
        Edit[] edits = new Edit[code.size()];
        Arrays.fill(edits, Edit.KEEP);
        BitSet[] liveOut = liveOut(method);
        for (int index = 0; index < code.size(); index++) {
            AbstractInsnNode instruction = code.get(index);
            if (instruction instanceof IincInsnNode increment && !liveOut[index].get(increment.var)) {
                edits[index] = Edit.DROP;
            } else if (instruction instanceof VarInsnNode store && isStore(store.getOpcode()) && !liveOut[index].get(store.var)) {
                AbstractInsnNode previous = instruction.getPrevious();
                if (previous != null && pushesOnePlainValue(previous)) {
                    edits[index] = Edit.DROP;
                    edits[code.indexOf(previous)] = Edit.DROP;
                } else {
                    edits[index] = store.getOpcode() == Opcodes.LSTORE || store.getOpcode() == Opcodes.DSTORE ? Edit.POP2 : Edit.POP;
                }
            }
        }
        return edits;
    }

    /** The variables some path from just after each instruction reads before writing. */
    private static BitSet[] liveOut(MethodNode method) {
        InsnList code = method.instructions;
        int size = code.size();
        List<List<Integer>> successors = ControlFlow.successors(method);
        BitSet[] liveIn = new BitSet[size];
        BitSet[] liveOut = new BitSet[size];
        for (int index = 0; index < size; index++) {
            liveIn[index] = new BitSet();
            liveOut[index] = new BitSet();
        }
        boolean changed = true;
        while (changed) {
            changed = false;
            for (int index = size - 1; index >= 0; index--) {
                BitSet out = new BitSet();
                successors.get(index).forEach(next -> out.or(liveIn[next]));
                BitSet in = (BitSet) out.clone();
                AbstractInsnNode instruction = code.get(index);
                if (instruction instanceof VarInsnNode variable) {
                    if (isStore(variable.getOpcode())) {
                        in.clear(variable.var);
                    } else {
                        in.set(variable.var);
                    }
                }
                if (!out.equals(liveOut[index]) || !in.equals(liveIn[index])) {
                    liveOut[index] = out;
                    liveIn[index] = in;
                    changed = true;
                }
            }
        }
        return liveOut;
    }

    private static boolean isStore(int opcode) {
        return opcode >= Opcodes.ISTORE && opcode <= Opcodes.ASTORE;
    }

    /** A constant or a local variable: pushing it does nothing else. */
    private static boolean pushesOnePlainValue(AbstractInsnNode instruction) {
        int opcode = instruction.getOpcode();
        return (opcode >= Opcodes.ACONST_NULL && opcode <= Opcodes.LDC) || (opcode >= Opcodes.ILOAD && opcode <= Opcodes.ALOAD);
    }
}
