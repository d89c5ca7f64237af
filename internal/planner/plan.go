package planner

import (
	"fmt"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/acoustics"
	"arcwright/internal/geometry"
	"arcwright/internal/jet"
)

// Verdict is the outcome of a check. Verdicts are ordered: a worse verdict
// is larger.
type Verdict int

// Verdicts.
const (
	OK      Verdict = iota + 1 // the condition holds with its margin
	Warn                       // usable, but the engineer should look
	Blocked                    // the station must not be used as placed
)

func (v Verdict) String() string {
	switch v {
	case OK:
		return "ok"
	case Warn:
		return "warn"
	case Blocked:
		return "blocked"
	}
	return fmt.Sprintf("Verdict(%d)", int(v))
}

// MarshalText writes "ok", "warn" or "blocked".
func (v Verdict) MarshalText() ([]byte, error) { return []byte(v.String()), nil }

// Check names.
const (
	CheckVelocity   = "velocity_clearance" // clearance of microphone, pole and boom from the velocity zone, m
	CheckHot        = "hot_clearance"      // clearance from the hot zone, m
	CheckWall       = "wall_clearance"     // clearance from the boundary, m
	CheckObstacle   = "obstacle_clearance" // clearance from obstacles, m
	CheckKeepOut    = "keepout_clearance"  // clearance from keep-out zones, m
	CheckSpacing    = "stand_spacing"      // gap to the nearest other stand, m
	CheckSight      = "line_of_sight"      // fraction of the source region in view, 1 = clear
	CheckFarField   = "far_field_ratio"    // distance from the source over Dj
	CheckWavelength = "wavelengths"        // distance over the wavelength at the band's low end
	CheckFresnel    = "fresnel_ratio"      // distance over L²/λ, worst band
	CheckSourceErr  = "source_offset_db"   // level error of a nozzle-centred source, dB
	CheckGround     = "ground_null_hz"     // first floor-interference null, Hz
	CheckAbsorption = "absorption_db"      // atmospheric loss at the band's top, dB
	CheckInflow     = "inflow_m_s"         // entrained inflow speed at the microphone, m/s
	CheckBuoyancy   = "buoyant_plume"      // 1 when above a rising plume within its reach
	CheckHeight     = "height_clearance"   // microphone height above the floor and below the ceiling, m
	CheckAsBuilt    = "as_built_offset"    // how far the measured microphone is from its planned place, m (as-built checks only)
)

// The surfaces an [Impingement] names.
const (
	SurfaceBoundary = "boundary" // the walls, or an outdoor site's limit
	SurfaceFloor    = "floor"    // the floor, or the ground of a pad
	SurfaceCeiling  = "ceiling"
	SurfaceObstacle = "obstacle"
)

// Impingement is where a conservative zone of an operating point first
// reaches a surface of the cell: there the exhaust turns into a wall jet
// that the free-jet model does not describe.
type Impingement struct {
	Point    string   // the operating point
	Zone     jet.Zone // velocity or hot
	Surface  string   // SurfaceBoundary, SurfaceFloor, SurfaceCeiling or SurfaceObstacle
	Obstacle string   // the obstacle's name for SurfaceObstacle, else ""
	// X is the jet-frame distance of the first contact, m.
	X float64
	// At is where to mark it in plan, cell frame, m: the zone's edge
	// outside the boundary, else the axis at X.
	At orb.Point
}

// Measurement says where the position a station was checked at comes from.
type Measurement int

const (
	// NoAsBuilt: no as-built positions were given; the planned position.
	NoAsBuilt Measurement = iota
	// Measured: the as-built positions give this station's.
	Measured
	// NotMeasured: as-built positions were given, but not this station's;
	// its planned position was checked.
	NotMeasured
)

// Check is one condition at one station: a number, a verdict and a reason
// in words. Value is NaN where the check does not apply (for example the
// floor null over a treated floor); such a check is OK.
type Check struct {
	Name    string
	Value   float64
	Unit    string
	Verdict Verdict
	Point   string // the operating point that governs it; "" if none does
	Reason  string
}

// Station is one placed microphone (or, for probe arrays, one checked stand).
type Station struct {
	ID      string
	Array   string
	Kind    ArrayKind
	Index   int // position within its array, from 1
	Channel int // data-system channel; 0 for probe stands
	// Mic is the microphone (or probe tip) in the cell frame, m.
	Mic r3.Vec
	// Planned is where the plan puts the microphone when Mic is an
	// as-built position (Request.AsBuilt); nil otherwise.
	Planned *r3.Vec
	// Measurement says whether Mic and Base are measured (as built), and
	// whether as-built positions were given at all.
	Measurement Measurement
	// PlannedBase is where the plan puts the stand pole when the station is
	// Measured; nil otherwise.
	PlannedBase *orb.Point
	// BaseMeasured is true when the as-built positions give the stand
	// pole too; otherwise a measured station's Base is derived from its
	// measured microphone.
	BaseMeasured bool
	// Base is the plan position of the stand pole, m (equal to the
	// microphone's plan position when the stand has no boom).
	Base orb.Point
	// Stand is the stand type; nil for a microphone flush on the floor.
	Stand *Stand
	// Jet is the microphone in the jet frame.
	Jet geometry.JetPoint
	// Radius is the distance from the array's centre on the axis (arcs) or
	// from the nozzle exit (others), m.
	Radius float64
	// Polar is the polar angle in the layout's convention, seen from the
	// array's centre on the axis (arcs) or from the nozzle exit, rad.
	Polar float64
	// Nominal is the requested polar angle (arcs, polar-stepped lines) or
	// NaN, rad.
	Nominal float64
	// Height of the microphone above the floor, m.
	Height float64
	// Incidence is how to aim the microphone.
	Incidence Incidence
	// AimAt is the point the microphone should be aimed at (cell frame).
	AimAt r3.Vec

	// Levels are the predicted levels at the microphone, one per
	// operating point in the order of Plan.Points.
	Levels []Level

	Status    Verdict
	Governing string // the operating point of the worst check
	Checks    []Check
	Reasons   []string // one line per check that is not OK, worst first
}

// Check returns the check named name.
func (s *Station) Check(name string) (Check, bool) {
	for _, c := range s.Checks {
		if c.Name == name {
			return c, true
		}
	}
	return Check{}, false
}

// PointResult is the prediction for one operating point.
type PointResult struct {
	Name      string
	Condition jet.Condition
	Plume     *jet.Plume
	Exit      jet.Exit
	// Core lengths, m.
	CoreNominal, CoreConservative float64
	// SourceEnd is the downstream end of the noise-source region on the
	// axis, m (the lowest frequency's source extent, at least the
	// conservative core).
	SourceEnd float64
	// Capture compares the plume with the exhaust collector.
	Capture         Verdict
	CaptureReason   string
	CaptureDiameter float64 // predicted plume diameter at the collector inlet, m; 0 without a collector
	Flags           []jet.Flag
}

// Velocity returns the conservative velocity zone.
func (p *PointResult) Velocity() *jet.Envelope {
	return p.Plume.Envelope(jet.VelocityZone, jet.Conservative)
}

// Hot returns the conservative hot zone.
func (p *PointResult) Hot() *jet.Envelope { return p.Plume.Envelope(jet.HotZone, jet.Conservative) }

// ArrayResult summarises one array.
type ArrayResult struct {
	Name string
	Kind ArrayKind
	// Spec is the array as requested (with the chosen radius filled in for
	// automatic arcs).
	Spec Array
	// Centre is the arc centre (arcs), the point on the axis the polar
	// angles are seen from (lines), or the ring's centre on the axis, in the
	// cell frame, m; the nozzle exit for points and probes.
	Centre r3.Vec
	// Radius of an arc, m; ring radius from the axis; line offset; 0 for
	// points and probes.
	Radius float64
	Auto   bool // the radius was chosen by the planner
	// MaxRadius is the largest arc radius that keeps every requested angle
	// inside the room with its clearances, m (arcs only).
	MaxRadius float64
	// FarField is the interval of arc radii that meets the far-field
	// criteria and fits the room; Lo > Hi means empty. FarFieldNote says
	// what limits it.
	FarField     [2]float64
	FarFieldNote string
	// MinClearPolar is the polar angle (layout convention, rad) closest to
	// the downstream axis that clears the zones at this radius; NaN if none.
	MinClearPolar float64
	// Blocked lists angle ranges or stations that are blocked, and by what.
	Blocked []string
	// Notes are other remarks (stations clipped by the floor or room).
	Notes    []string
	Stations int

	edge nearLine // a near-field line's plume edge (PlacedRadius)
}

// AbsorptionRow is one 1/3-octave band of the absorption table.
type AbsorptionRow struct {
	Band    acoustics.Band
	PerM    float64   // dB/m
	ArrayDB []float64 // loss over each array's typical path (in Plan.Arrays order), dB
}

// Plan is the planner's answer for one request.
type Plan struct {
	Request *Request
	Points  []PointResult
	// Governing is the index in Points of the operating point with the
	// largest conservative velocity zone: the one the sheet draws.
	Governing int
	// GoverningHot is the index in Points of the operating point with the
	// longest conservative hot zone (Governing when no point has one): the
	// hot zone the sheet draws.
	GoverningHot int
	Arrays       []ArrayResult
	// Attached lists the zones that the floor, the ceiling and the walls
	// carry on where the free zones reach them (wall jets), for every
	// operating point.
	Attached   []Attached
	Stations   []Station
	Absorption []AbsorptionRow
	// Crew is every crew position's exposure, one entry per operating
	// point, crew positions in layout order.
	Crew []CrewExposure
	// Impingements lists where each point's conservative zones reach the
	// boundary, the floor, the ceiling or an obstacle upstream of the
	// collector: what the warnings say in words and the sheet marks.
	Impingements []Impingement
	Warnings     []string
	// Counts of stations by verdict.
	OK, Warn, Blocked int
}
