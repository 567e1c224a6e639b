package tetrapod.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import tetrapod.common.BadInputException;

/**
 * Which values of a spec, as written with its defaults filled in, the model file did not give:
 * the JSON paths (e.g. {@code $.segments[0].horizontals}) present in the filled-in spec and absent
 * from the file. A whole object filled in is one path, not one per key inside it.
 */
public final class DefaultedKeys {

    private DefaultedKeys() { }

    /** The paths of {@code filledIn} that the model file at {@code modelFile} does not have, in document order. */
    public static List<String> of(Path modelFile, Map<String, Object> filledIn) throws BadInputException {
        return of(PlainJson.read(modelFile), filledIn);
    }

    /** The paths of {@code filledIn} that {@code given} (the file as plain values) does not have. */
    public static List<String> of(Object given, Map<String, Object> filledIn) {
        List<String> out = new ArrayList<>();
        walk(given, filledIn, "$", out);
        return List.copyOf(out);
    }

    private static void walk(Object given, Object filled, String path, List<String> out) {
        if (filled instanceof Map<?, ?> map && given instanceof Map<?, ?> givenMap) {
            for (Map.Entry<?, ?> e : map.entrySet()) {
                String key = String.valueOf(e.getKey());
                String at = path + "." + key;
                if (!givenMap.containsKey(key)) {
                    out.add(at);
                } else {
                    walk(givenMap.get(key), e.getValue(), at, out);
                }
            }
        } else if (filled instanceof List<?> list && given instanceof List<?> givenList
                && list.size() == givenList.size()) {
            for (int k = 0; k < list.size(); k++) {
                walk(givenList.get(k), list.get(k), path + "[" + k + "]", out);
            }
        }
    }
}
