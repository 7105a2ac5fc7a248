// Quick look: how much does half a millimetre of copper or of 80 % nickel-iron give,
// 5 cm from a small magnetic source, at mains frequency and at 20 kHz?
// Run from the repository root after building (./mvnw -q -B -DskipTests package):
//   jshell --class-path shield-examples/target/shield-all.jar shield-examples/jshell/quick-look.jsh
import static io.shieldmath.shield.quantity.Quantities.*;
import io.shieldmath.shield.field.*;
import io.shieldmath.shield.planar.*;
import io.shieldmath.shield.materials.*;
import io.shieldmath.shield.materials.files.*;

var catalogue = Catalogue.builtIn();
var loop = IncidentField.magneticNearField(cm(5), ImpedanceForm.EXACT_DIPOLE);
for (String id : new String[] {"copper-annealed", "nickel-iron-80"}) {
    var plate = Barrier.of(catalogue.get(id), mm(0.5)).facing(loop);
    System.out.printf("%-16s 50 Hz: %6.1f dB   20 kHz: %6.1f dB%n", id,
            plate.at(Hz(50)).shieldingEffectivenessDb(), plate.at(kHz(20)).shieldingEffectivenessDb());
}
