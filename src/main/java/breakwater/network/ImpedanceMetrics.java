package breakwater.network;

import java.util.List;

/**
 * How the impedance behaves in the band.
 *
 * @param targetOhms      target impedance Z_t
 * @param peakOhms        largest |Z| in the band
 * @param peakHz          where it occurs
 * @param minOhms         smallest |Z| in the band
 * @param minHz           where it occurs
 * @param flatnessDb      flatness: 20·log10(peak / min) in the band, the max/min ratio of |Z| in dB
 * @param antiResonances  every local maximum of |Z| inside the band, ascending in frequency
 */
public record ImpedanceMetrics(double targetOhms, double peakOhms, double peakHz, double minOhms, double minHz,
                               double flatnessDb, List<AntiResonance> antiResonances) {
    public ImpedanceMetrics {
        antiResonances = List.copyOf(antiResonances);
    }

    /** peak / target: 1 means the curve touches the target. */
    public double peakOverTarget() {
        return peakOhms / targetOhms;
    }

    public boolean underTarget() {
        return peakOhms <= targetOhms;
    }
}
