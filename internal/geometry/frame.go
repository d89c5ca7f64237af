package geometry

import (
	"fmt"
	"math"

	"gonum.org/v1/gonum/spatial/r3"
)

// JetFrame places a jet in the cell: the centre of the nozzle exit plane and
// the heading of the jet axis in plan. The axis is horizontal.
//
// Jet coordinates ([JetPoint]) are cylindrical about the axis: X downstream
// from the exit plane, R from the axis, and Azimuth about the axis, measured
// from the horizontal on the jet's left, upwards:
//
//	looking downstream, from behind the nozzle:
//
//	                  up, Azimuth = π/2
//	                          |
//	                          |
//	 left, Azimuth = 0 ---- (axis) ---- right, Azimuth = π
//	                          |
//	                          |
//	                 down, Azimuth = 3π/2
//
//	in plan, from above (the jet along heading h from +X):
//
//	            left, Azimuth = 0
//	                 ^
//	                 |
//	      exit  o===========>  X, downstream
//	                 |
//	                 v
//	            right, Azimuth = π
//
// Seen looking downstream the azimuth turns clockwise (left, up, right,
// down); it is a right-handed turn about the downstream axis. The left unit
// vector is the axis turned 90° counter-clockwise in plan,
// (−sin h, cos h, 0), and up is +Z.
type JetFrame struct {
	Exit    r3.Vec  // centre of the nozzle exit plane, cell frame, m
	Heading float64 // heading of the downstream axis in plan, rad from +X counter-clockwise
}

// JetPoint is a position in jet coordinates (see [JetFrame]).
type JetPoint struct {
	X       float64 // axial distance downstream of the exit plane, m (negative upstream)
	R       float64 // distance from the jet axis, m, >= 0
	Azimuth float64 // angle about the axis, rad, in [0, 2π) from [JetFrame.ToJet]
}

// Validate returns nil when Exit and Heading are finite and the exit
// coordinates are at most [MaxCoord] in magnitude, and otherwise an
// [*InputError] naming the bad field.
func (f JetFrame) Validate() error {
	for _, v := range []struct {
		name string
		v    float64
	}{{"Exit.X", f.Exit.X}, {"Exit.Y", f.Exit.Y}, {"Exit.Z", f.Exit.Z}} {
		if err := checkCoord(v.name, v.v); err != nil {
			return err
		}
	}
	return checkFinite("Heading", f.Heading)
}

// Axis returns the unit vector along the jet axis, downstream, cell frame.
func (f JetFrame) Axis() r3.Vec {
	s, c := math.Sincos(f.Heading)
	return r3.Vec{X: c, Y: s}
}

// left returns the unit vector to the jet's left, horizontal.
func (f JetFrame) left() r3.Vec {
	s, c := math.Sincos(f.Heading)
	return r3.Vec{X: -s, Y: c}
}

// ToJet returns the jet coordinates of p (cell frame, m). Azimuth is in
// [0, 2π). A point within [BoundaryTol] of the axis is on it: R = 0 and
// Azimuth = 0 (the rounding of the heading's sine and cosine would
// otherwise give an arbitrary azimuth there).
func (f JetFrame) ToJet(p r3.Vec) JetPoint {
	d := r3.Sub(p, f.Exit)
	u, l := f.Axis(), f.left()
	x, y, z := r3.Dot(d, u), r3.Dot(d, l), d.Z
	r := math.Hypot(y, z)
	if r <= BoundaryTol {
		return JetPoint{X: x}
	}
	az := math.Atan2(z, y)
	if az <= 0 { // also turns −0 into +0
		az += 2 * math.Pi
		if az >= 2*math.Pi { // ±0 and tiny negative angles round up to 2π
			az = 0
		}
	}
	return JetPoint{X: x, R: r, Azimuth: az}
}

// ToCell returns the cell-frame position, m, of the jet point q. Any finite
// azimuth is accepted; a negative R is the point at |R| on the opposite side.
func (f JetFrame) ToCell(q JetPoint) r3.Vec {
	s, c := math.Sincos(q.Azimuth)
	u, l := f.Axis(), f.left()
	return r3.Vec{
		X: f.Exit.X + q.X*u.X + q.R*c*l.X,
		Y: f.Exit.Y + q.X*u.Y + q.R*c*l.Y,
		Z: f.Exit.Z + q.R*s,
	}
}

// Polar returns the polar angle of q measured from the downstream jet axis,
// rad, atan2(R, X) in [0, π]: 0 on the axis downstream, π/2 in the exit
// plane, π on the axis upstream. The exit centre itself gives 0. The angle
// from the upstream (inlet) axis is π − Polar.
func (q JetPoint) Polar() float64 {
	if q.X == 0 && q.R == 0 {
		return 0 // atan2(±0, −0) would give π
	}
	return math.Atan2(q.R, q.X)
}

// Distance returns the distance of q from the exit centre, m, sqrt(X² + R²).
func (q JetPoint) Distance() float64 { return math.Hypot(q.X, q.R) }

// String formats q as "X=… m R=… m azimuth=…°" for messages and tests.
func (q JetPoint) String() string {
	return fmt.Sprintf("X=%.6g m R=%.6g m azimuth=%.6g°", q.X, q.R, q.Azimuth*180/math.Pi)
}
