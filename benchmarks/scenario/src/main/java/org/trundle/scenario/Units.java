package org.trundle.scenario;

/** The unit of a scenario value from its key's name, for axis titles (SI; degrees for _deg keys). */
public final class Units {
    private Units() {
    }

    /**
     * @param path a dotted path such as {@code start.velocity[2]}
     * @return the path with its unit, such as {@code start.velocity[2] (m/s)}
     */
    public static String label(String path) {
        String key = path.replaceAll("\\[\\d+\\]", "");
        key = key.substring(key.lastIndexOf('.') + 1);
        String unit;
        if (key.endsWith("_deg")) {
            unit = "degrees";
        } else {
            switch (key) {
                case "velocity":
                case "speed":
                    unit = "m/s";
                    break;
                case "spin":
                    unit = "rad/s";
                    break;
                case "gravity":
                    unit = "m/s^2";
                    break;
                case "mass":
                    unit = "kg";
                    break;
                case "duration":
                case "sample_interval":
                case "max_check_interval":
                    unit = "s";
                    break;
                case "static_friction":
                case "kinetic_friction":
                case "restitution":
                case "inertia":
                case "tolerance":
                    unit = "";
                    break;
                default:
                    unit = "m";
            }
        }
        return unit.isEmpty() ? path + " (-)" : path + " (" + unit + ")";
    }
}
