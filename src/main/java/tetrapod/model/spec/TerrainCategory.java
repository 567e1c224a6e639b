package tetrapod.model.spec;

/** Terrain categories of EN 1991-1-4 Table 4.1, by the names the file uses. */
public enum TerrainCategory {
    CAT_0("0"), CAT_I("I"), CAT_II("II"), CAT_III("III"), CAT_IV("IV");

    private final String jsonName;

    TerrainCategory(String jsonName) {
        this.jsonName = jsonName;
    }

    public String jsonName() {
        return jsonName;
    }
}
