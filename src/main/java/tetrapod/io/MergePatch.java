package tetrapod.io;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.Iterator;
import java.util.Map;

/**
 * JSON Merge Patch (RFC 7386 section 2, with its verified erratum 4132; restated unchanged by
 * RFC 7396): a patch object's members replace the target's, a member whose value is null removes
 * the target's, objects merge recursively, and anything else (arrays included) replaces the whole
 * target. Neither argument is modified.
 */
public final class MergePatch {

    private MergePatch() { }

    /** The target with the patch applied. */
    public static JsonNode apply(JsonNode target, JsonNode patch) {
        if (!patch.isObject()) {
            return patch.deepCopy();
        }
        // RFC 7386 section 2: a target that is no object is replaced by an empty one before merging
        ObjectNode result = target != null && target.isObject() ? ((ObjectNode) target).deepCopy()
                : JsonNodeFactory.instance.objectNode();
        for (Iterator<Map.Entry<String, JsonNode>> it = patch.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> member = it.next();
            if (member.getValue().isNull()) {
                result.remove(member.getKey());
            } else {
                result.set(member.getKey(), apply(result.get(member.getKey()), member.getValue()));
            }
        }
        return result;
    }
}
