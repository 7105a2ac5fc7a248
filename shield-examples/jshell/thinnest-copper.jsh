// How thin can a copper plate be and still give 60 dB from 10 kHz to 100 kHz in a plane wave
// and in the near field of a loop 10 cm away?
import static io.shieldmath.shield.quantity.Quantities.*;
import io.shieldmath.shield.field.*;
import io.shieldmath.shield.planar.*;
import io.shieldmath.shield.design.*;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.materials.*;
import io.shieldmath.shield.materials.files.*;

var copper = Catalogue.builtIn().get("copper-annealed");
var band = FrequencyBand.of(kHz(10), kHz(100));
for (var field : new IncidentField[] {IncidentField.planeWave(),
        IncidentField.magneticNearField(cm(10), ImpedanceForm.TEXTBOOK)}) {
    var plate = Barrier.of(copper, mm(1));
    var s = ThicknessSolver.resizing(plate, plate.layers().get(0)).facing(field).over(band).toMeet(Decibels.of(60)).upTo(mm(10));
    System.out.println(field + ": " + s.explanation());
}
