package dev.changeling.compile;

import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;
import java.lang.reflect.Modifier;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.function.Supplier;

/**
 * Calls every public static method of a class on a grid of inputs and writes down what came out
 * (a value, or the exception thrown), so two compilations of one class can be compared.
 */
final class Outcomes {

    private static final Map<Class<?>, List<Supplier<Object>>> GRID = Map.of(
            int.class, values(-3, -1, 0, 1, 2, 5, 9),
            long.class, values(-4L, 0L, 3L),
            boolean.class, values(true, false),
            char.class, values('a', 'm', 'Z'),
            String.class, values(null, "", "ab", "fern"),
            Integer.class, values(null, 0, 4),
            int[].class, List.of(() -> new int[] {3, 1, 2}, () -> new int[0], () -> new int[] {-2, 7}));

    private Outcomes() {
    }

    /** The outcomes with the given schema points switched on (none for the unmutated program). */
    static List<String> run(ClassLoader loader, String className, int... active) {
        try {
            Class<?> probe = loader.loadClass("dev.changeling.probe.Probe");
            int highest = Arrays.stream(active).max().orElse(0);
            probe.getMethod("prepare", int.class, int.class).invoke(null, highest + 1, 0);
            probe.getMethod("activate", int[].class).invoke(null, (Object) active);
            return run(loader.loadClass(className));
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException(e);
        }
    }

    private static List<String> run(Class<?> type) {
        List<Method> methods = Arrays.stream(type.getDeclaredMethods())
                .filter(m -> Modifier.isStatic(m.getModifiers()) && Modifier.isPublic(m.getModifiers()))
                .sorted(Comparator.comparing(Method::toString))
                .toList();
        List<String> outcomes = new ArrayList<>();
        for (Method method : methods) {
            for (List<Supplier<Object>> arguments : grid(method.getParameterTypes(), 0)) {
                Object[] values = arguments.stream().map(Supplier::get).toArray();
                String call = method.getName() + Arrays.deepToString(values);
                outcomes.add(call + " -> " + invoke(method, values));
            }
        }
        return outcomes;
    }

    private static String invoke(Method method, Object[] values) {
        try {
            Object result = method.invoke(null, values);
            return Arrays.deepToString(new Object[] {result}) + " after " + Arrays.deepToString(values);
        } catch (InvocationTargetException e) {
            return "threw " + e.getCause().getClass().getName();
        } catch (IllegalAccessException e) {
            throw new IllegalStateException(e);
        }
    }

    private static List<List<Supplier<Object>>> grid(Class<?>[] types, int from) {
        if (from == types.length) {
            return List.of(List.of());
        }
        List<Supplier<Object>> choices = GRID.get(types[from]);
        if (choices == null) {
            throw new IllegalArgumentException("no test inputs for " + types[from]);
        }
        List<List<Supplier<Object>>> rows = new ArrayList<>();
        for (Supplier<Object> choice : choices) {
            for (List<Supplier<Object>> rest : grid(types, from + 1)) {
                List<Supplier<Object>> row = new ArrayList<>();
                row.add(choice);
                row.addAll(rest);
                rows.add(row);
            }
        }
        return rows;
    }

    private static List<Supplier<Object>> values(Object... values) {
        return Arrays.stream(values).<Supplier<Object>>map(value -> () -> value).toList();
    }
}
