package tetrapod.load;

import tetrapod.common.Units;
import tetrapod.model.spec.IceSpec;
import tetrapod.model.spec.WindSpec;

/** From the file's wind and ice settings (m/s, kPa) to the method objects (SI). */
public final class WindProfiles {

    private WindProfiles() { }

    /** The wind on the bare tower. */
    public static WindProfile of(WindSpec spec) {
        if (spec instanceof WindSpec.En1991 en) {
            return new En1991Wind(en.terrain(), en.basicSpeed(), en.seasonFactor(), en.orography(),
                    en.turbulenceFactor(), en.airDensity(), en.structuralFactor(), en.directionFactors());
        }
        if (spec instanceof WindSpec.Asce7 a) {
            return new Asce7Wind(a.edition(), a.exposure(), a.speed(), a.topographicFactor(), a.elevationFactor(),
                    a.directionalityFactor(), a.gustFactor());
        }
        WindSpec.Uniform u = (WindSpec.Uniform) spec;
        return new UniformWind(u.pressure() * Units.KPA, u.forceCoefficient());
    }

    /** The wind that comes with the ice: the ice's wind speed (or pressure) where given, else the wind's own. */
    public static WindProfile withIce(WindSpec spec, IceSpec ice) {
        WindProfile bare = of(spec);
        if (bare instanceof En1991Wind en && Double.isFinite(ice.windSpeed())) {
            return en.withBasicSpeed(ice.windSpeed());
        }
        if (bare instanceof Asce7Wind a && Double.isFinite(ice.windSpeed())) {
            return a.withSpeed(ice.windSpeed());
        }
        if (bare instanceof UniformWind u && Double.isFinite(ice.windPressure())) {
            return u.withPressure(ice.windPressure() * Units.KPA);
        }
        return bare;
    }

    /**
     * The ice of the spec in SI: the design thickness as given, or from the ASCE 7 map values with the
     * wind's K_zt (ASCE 7 (10.4-5)).
     */
    public static Asce7Ice ice(IceSpec ice, WindSpec wind) {
        if (ice == null) {
            return Asce7Ice.NONE;
        }
        if (ice.thickness() instanceof IceSpec.Asce7Map map) {
            double kzt = wind instanceof WindSpec.Asce7 a ? a.topographicFactor() : 1.0;
            return Asce7Ice.fromMap(new Asce7Ice.MapValues(map.nominal() * Units.MM, map.importanceFactor(), kzt),
                    ice.density());
        }
        IceSpec.Given given = (IceSpec.Given) ice.thickness();
        return new Asce7Ice(given.thickness() * Units.MM, ice.density(), given.heightFactor());
    }
}
