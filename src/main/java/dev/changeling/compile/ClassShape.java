package dev.changeling.compile;

import java.util.ArrayDeque;
import java.util.Arrays;
import java.util.Deque;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.objectweb.asm.ClassReader;
import org.objectweb.asm.Handle;
import org.objectweb.asm.Opcodes;
import org.objectweb.asm.Type;
import org.objectweb.asm.tree.AbstractInsnNode;
import org.objectweb.asm.tree.ClassNode;
import org.objectweb.asm.tree.FieldInsnNode;
import org.objectweb.asm.tree.FieldNode;
import org.objectweb.asm.tree.IincInsnNode;
import org.objectweb.asm.tree.InsnList;
import org.objectweb.asm.tree.IntInsnNode;
import org.objectweb.asm.tree.InvokeDynamicInsnNode;
import org.objectweb.asm.tree.JumpInsnNode;
import org.objectweb.asm.tree.LabelNode;
import org.objectweb.asm.tree.LdcInsnNode;
import org.objectweb.asm.tree.LookupSwitchInsnNode;
import org.objectweb.asm.tree.MethodInsnNode;
import org.objectweb.asm.tree.MethodNode;
import org.objectweb.asm.tree.MultiANewArrayInsnNode;
import org.objectweb.asm.tree.TableSwitchInsnNode;
import org.objectweb.asm.tree.TryCatchBlockNode;
import org.objectweb.asm.tree.TypeInsnNode;
import org.objectweb.asm.tree.VarInsnNode;

/**
 * The classes compiled from one source file, written out as text that two compilations share exactly when they
 * behave alike by three rules of ours beyond equal bytes: the order of the constant pool does not count; instructions
 * no path from a method's entry or a handler reaches do not count; and a store to a local variable that no later
 * instruction reads counts only for what computing its value does ({@link DeadStores}).
 */
final class ClassShape {

    private ClassShape() {
    }

    /** Whether two compilations of one file gave byte for byte the same classes. */
    static boolean sameBytes(Map<String, byte[]> left, Map<String, byte[]> right) {
        return left.keySet().equals(right.keySet())
                && left.entrySet().stream().allMatch(entry -> Arrays.equals(entry.getValue(), right.get(entry.getKey())));
    }

    /** The text of the classes of one file (binary name to bytes), after the two rules. */
    static String of(Map<String, byte[]> classes) {
        Map<String, ClassNode> nodes = new TreeMap<>();
        classes.forEach((name, bytes) -> {
            ClassNode node = new ClassNode();
            new ClassReader(bytes).accept(node, ClassReader.SKIP_DEBUG | ClassReader.SKIP_FRAMES);
            nodes.put(name, node);
        });
        StringBuilder text = new StringBuilder();
        for (ClassNode node : nodes.values()) {
            text.append("class ").append(node.access).append(' ').append(node.name).append(" : ").append(node.superName)
                    .append(' ').append(node.interfaces).append(" nest ").append(node.nestHostClass).append('\n');
            for (FieldNode field : node.fields) {
                text.append(" field ").append(field.access).append(' ').append(field.name).append(' ').append(field.desc)
                        .append(" = ").append(constant(field.value)).append('\n');
            }
            for (MethodNode method : node.methods) {
                text.append(" method ").append(method.access).append(' ').append(method.name).append(method.desc)
                        .append(' ').append(method.exceptions).append('\n');
                appendCode(method, text);
            }
        }
        return text.toString();
    }
    private static String key(String owner, String name, String desc) {
        return owner + "." + name + desc;
    }

    /** The reachable instructions in order, labels numbered by their place, handlers after them. */
    private static void appendCode(MethodNode method, StringBuilder text) {
        InsnList code = method.instructions;
        if (code.size() == 0) {
            return;
        }
        boolean[] reachable = reachable(method);
        DeadStores.Edit[] edits = DeadStores.edits(method);
        Map<LabelNode, Integer> labels = new HashMap<>();
        for (AbstractInsnNode instruction : code) {
            if (instruction instanceof LabelNode label) {
                labels.put(label, labels.size());
            }
        }
        for (AbstractInsnNode instruction : code) {
            int index = code.indexOf(instruction);
            if (instruction instanceof LabelNode label) {
                text.append("  L").append(labels.get(label)).append('\n');
            } else if (instruction.getOpcode() >= 0 && reachable[index]) {
                switch (edits[index]) {
                    case KEEP -> text.append("  ").append(instruction.getOpcode()).append(operands(instruction, labels)).append('\n');
                    case POP -> text.append("  ").append(Opcodes.POP).append('\n');
                    case POP2 -> text.append("  ").append(Opcodes.POP2).append('\n');
                    case DROP -> { }
                }
            }
        }
        for (TryCatchBlockNode handler : method.tryCatchBlocks) {
            text.append("  try L").append(labels.get(handler.start)).append("-L").append(labels.get(handler.end))
                    .append(" catch ").append(handler.type).append(" at L").append(labels.get(handler.handler)).append('\n');
        }
    }

    private static String operands(AbstractInsnNode instruction, Map<LabelNode, Integer> labels) {
        if (instruction instanceof IntInsnNode number) {
            return " " + number.operand;
        } else if (instruction instanceof VarInsnNode variable) {
            return " v" + variable.var;
        } else if (instruction instanceof IincInsnNode increment) {
            return " v" + increment.var + " " + increment.incr;
        } else if (instruction instanceof TypeInsnNode type) {
            return " " + type.desc;
        } else if (instruction instanceof FieldInsnNode field) {
            return " " + key(field.owner, field.name, field.desc);
        } else if (instruction instanceof MethodInsnNode call) {
            return " " + key(call.owner, call.name, call.desc);
        } else if (instruction instanceof InvokeDynamicInsnNode dynamic) {
            return " " + dynamic.name + dynamic.desc + " " + constant(dynamic.bsm) + " " + Arrays.stream(dynamic.bsmArgs).map(ClassShape::constant).toList();
        } else if (instruction instanceof LdcInsnNode load) {
            return " " + constant(load.cst);
        } else if (instruction instanceof JumpInsnNode jump) {
            return " L" + labels.get(jump.label);
        } else if (instruction instanceof TableSwitchInsnNode table) {
            return " " + table.min + ".." + table.max + " L" + labels.get(table.dflt) + " " + table.labels.stream().map(labels::get).toList();
        } else if (instruction instanceof LookupSwitchInsnNode lookup) {
            return " " + lookup.keys + " L" + labels.get(lookup.dflt) + " " + lookup.labels.stream().map(labels::get).toList();
        } else if (instruction instanceof MultiANewArrayInsnNode array) {
            return " " + array.desc + " " + array.dims;
        }
        return "";
    }

    /** A constant with its type, so that the int 1 and the long 1 differ. */
    private static String constant(Object value) {
        if (value == null) {
            return "-";
        }
        if (value instanceof Handle handle) {
            return "handle " + handle.getTag() + " " + key(handle.getOwner(), handle.getName(), handle.getDesc());
        }
        if (value instanceof Type type) {
            return "type " + type.getDescriptor();
        }
        return value.getClass().getSimpleName() + " " + value;
    }

    /** Which instructions some path from the entry reaches (a handler from the instructions it covers). */
    private static boolean[] reachable(MethodNode method) {
        List<List<Integer>> successors = ControlFlow.successors(method);
        boolean[] seen = new boolean[successors.size()];
        Deque<Integer> pending = new ArrayDeque<>();
        pending.push(0);
        while (!pending.isEmpty()) {
            int index = pending.pop();
            if (!seen[index]) {
                seen[index] = true;
                successors.get(index).forEach(pending::push);
            }
        }
        return seen;
    }
}
