// Start-up script for the noninertial frames library: imports every public package so that an
// analyst can start typing at once. Conventions: SI units; the orientation R of a frame F in its
// base B maps B components to F components (v_F = R v_B); angular velocity and acceleration of F
// relative to B are resolved in F.
import java.time.Instant;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.linear.*;
import dev.noninertial.frames.*;
import dev.noninertial.frames.motion.*;
import dev.noninertial.frames.dynamics.*;
import dev.noninertial.frames.uncertainty.*;
import dev.noninertial.frames.dispersion.*;
import dev.noninertial.frames.units.*;
import dev.noninertial.frames.sensing.*;
import dev.noninertial.geodesy.*;
import dev.noninertial.geodesy.air.*;
import dev.noninertial.geodesy.navigation.*;
import dev.noninertial.frames.sensing.*;
