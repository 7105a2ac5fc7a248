// What should this plate read between my coils at these frequencies?
// An invented bench: two 20-turn coils of 10 mm radius, 50 mm apart, driven with 100 mA RMS;
// a 2 mm aluminium plate of 25 mm radius midway. The finite plate is solved by finite elements;
// the infinite sheet of the same metal is shown beside it.
// Run from the repository root after building (./mvnw -q -B -DskipTests package):
//   jshell --class-path shield-examples/target/shield-all.jar shield-examples/jshell/plate-on-bench.jsh
import static io.shieldmath.shield.quantity.Quantities.*;
import io.shieldmath.shield.axisymmetric.*;
import io.shieldmath.shield.coupling.*;
import io.shieldmath.shield.materials.*;
import io.shieldmath.shield.quantity.Frequency;

var pair = CoilPair.coaxial(Coil.loop(mm(10), 20), Coil.loop(mm(10), 20), mm(50));
var bench = BenchPrediction.ofPlate(Catalogue.builtIn().get("aluminium-1100-o"), mm(25), mm(2), pair);
for (Frequency f : new Frequency[] {kHz(1), kHz(10), kHz(100)}) {
    var p = bench.at(f);
    var drive = DriveCurrent.ofMilliamperes(100, AmplitudeMeasure.RMS, f);
    System.out.printf("%7s  plate %6.2f ± %.3f dB  sheet %6.2f dB  receiver %.4f mV pp without, %.4f mV pp with%n",
            f, p.finitePlateDb().value(), p.finitePlateDb().estimate(), p.infiniteSheetDb(),
            p.voltageWithoutPlate(drive).millivolts(AmplitudeMeasure.PEAK_TO_PEAK),
            p.voltageWithPlate(drive).millivolts(AmplitudeMeasure.PEAK_TO_PEAK));
}
