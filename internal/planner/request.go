package planner

import (
	"fmt"
	"math"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/acoustics"
	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/units"
)

// Convention is a polar-angle convention. A layout must name one: an angle
// range means opposite things under the two.
type Convention int

// Polar-angle conventions.
const (
	// FromInlet measures θi from the upstream (inlet) direction of the jet
	// axis: 180° is the downstream axis. θi = 180° − θj.
	FromInlet Convention = iota + 1
	// FromJetAxis measures θj from the downstream jet axis: 0° is in the
	// exhaust.
	FromJetAxis
)

func (c Convention) String() string {
	switch c {
	case FromInlet:
		return "from the inlet axis"
	case FromJetAxis:
		return "from the downstream jet axis"
	}
	return fmt.Sprintf("Convention(%d)", int(c))
}

// Symbol returns θi or θj.
func (c Convention) Symbol() string {
	if c == FromInlet {
		return "θi"
	}
	return "θj"
}

// FromDownstream converts a polar angle measured from the downstream axis
// (rad) into this convention (rad).
func (c Convention) FromDownstream(thetaJ float64) float64 {
	if c == FromInlet {
		return math.Pi - thetaJ
	}
	return thetaJ
}

// ToDownstream converts a polar angle in this convention (rad) into one
// measured from the downstream axis (rad).
func (c Convention) ToDownstream(theta float64) float64 {
	if c == FromInlet {
		return math.Pi - theta
	}
	return theta
}

// Title holds the facts of the title block.
type Title struct {
	Title, Facility, Test, Revision   string
	PreparedBy, CheckedBy, ApprovedBy string
	Date                              string // as the layout gives it; empty: the sheet prints the run date
}

// Ambient is the air in the cell.
type Ambient struct {
	Pressure    float64 // Pa
	Temperature float64 // K
	Humidity    float64 // relative humidity, percent (60 means 60 %)
}

// Stand is a named type of microphone or probe stand.
type Stand struct {
	Name string
	// BaseRadius is the radius of the base footprint on the floor, m.
	BaseRadius float64
	// BaseHeight is the height of the base above the floor, m.
	BaseHeight float64
	// PoleDiameter is the diameter of the vertical pole, m.
	PoleDiameter float64
	// BoomLength is the horizontal arm from the pole to the microphone, m;
	// 0 puts the microphone on top of the pole. The pole stands on the side
	// of the microphone away from the jet.
	BoomLength float64
	// Microphone is the microphone the stand carries; nil: none named.
	Microphone *acoustics.Microphone
}

// Limits are the thresholds and margins of the checks. The zero value of a
// field means its default (see [DefaultLimits]).
type Limits struct {
	Velocity      float64 // mean-velocity limit of the velocity zone, m/s; default 5
	Temperature   float64 // total-temperature limit of the hot zone, K; default 323.15 (50 °C)
	Margin        float64 // clearance required from each zone, m; default 0.25
	WallClearance float64 // clearance required from the boundary, m; default 0.3 (the quarter wavelength at the band's low end is added as a separate floor)
	StandSpacing  float64 // smallest gap between two stands' bases and poles, m; default 0.1
	Inflow        float64 // largest entrained inflow speed at a microphone, m/s; default 1
	FarFieldRatio float64 // smallest arc radius over fully expanded diameter; default 50 (common practice)
	Absorption    float64 // largest atmospheric loss over a path at the band's top, dB, before a warning; default 10
}

// DefaultLimits returns the defaults of every limit.
func DefaultLimits() Limits {
	return Limits{
		Velocity:      5,
		Temperature:   323.15,
		Margin:        0.25,
		WallClearance: 0.3,
		StandSpacing:  0.1,
		Inflow:        1,
		FarFieldRatio: 50,
		// 10 dB: beyond it the lossless correction dominates the measured
		// level and the signal nears the microphone's noise floor at the top
		// of the band (common practice).
		Absorption: 10,
	}
}

// WithDefaults returns l with its zero fields set to their defaults: the
// limits the planner checks against.
func (l Limits) WithDefaults() Limits { return l.withDefaults() }

// withDefaults fills zero fields with their defaults.
func (l Limits) withDefaults() Limits {
	d := DefaultLimits()
	for _, f := range []struct{ v, def *float64 }{
		{&l.Velocity, &d.Velocity}, {&l.Temperature, &d.Temperature}, {&l.Margin, &d.Margin},
		{&l.WallClearance, &d.WallClearance}, {&l.StandSpacing, &d.StandSpacing}, {&l.Inflow, &d.Inflow},
		{&l.FarFieldRatio, &d.FarFieldRatio}, {&l.Absorption, &d.Absorption},
	} {
		if *f.v == 0 {
			*f.v = *f.def
		}
	}
	return l
}

// Band is the frequency band of interest, Hz.
type Band struct{ Low, High float64 }

// ArrayKind is the pattern of an array.
type ArrayKind int

// Array kinds.
const (
	Arc       ArrayKind = iota + 1 // stations on a circle about a centre on the jet axis
	Line                           // a sideline parallel to the jet axis
	NearField                      // a line along the predicted plume edge at a set clearance
	Ring                           // stations around the axis at one axial distance
	Points                         // named single stations
	Probes                         // user-placed stands that are checked, not placed
)

func (k ArrayKind) String() string {
	switch k {
	case Arc:
		return "arc"
	case Line:
		return "line"
	case NearField:
		return "near-field line"
	case Ring:
		return "ring"
	case Points:
		return "points"
	case Probes:
		return "probe stands"
	}
	return fmt.Sprintf("ArrayKind(%d)", int(k))
}

// Incidence is how a microphone is aimed.
type Incidence int

// Incidences.
const (
	NormalIncidence  Incidence = iota + 1 // free-field microphone pointed at the source
	GrazingIncidence                      // pressure-field microphone with its diaphragm edge-on to the source
)

func (i Incidence) String() string {
	if i == GrazingIncidence {
		return "grazing incidence"
	}
	return "normal incidence"
}

// Fixed is a station at a given place.
type Fixed struct {
	Name    string
	At      r3.Vec // microphone (or probe tip) position in the cell frame, m
	Channel int    // 0: numbered in order
	Line    int    // line in the layout file, for messages; 0 unknown
}

// Array is one requested pattern of stations. Which fields apply depends on
// Kind; angles are radians in the layout's convention, lengths metres.
type Array struct {
	Name      string
	Kind      ArrayKind
	Stand     string    // stand type; "" means microphones flush on the floor (ground plane)
	Incidence Incidence // how the microphones are aimed; 0 means normal
	// FirstChannel is the channel of the first station; 0 continues from
	// the previous array.
	FirstChannel int
	Line         int // line in the layout file, for messages; 0 unknown

	// Arc: centre on the jet axis CenterX downstream of the exit; radius
	// Radius, or the largest the room allows when AutoRadius.
	CenterX    float64
	Radius     float64
	AutoRadius bool
	// Arc and polar-stepped Line: polar angles From, To, Step (From may
	// exceed To; Step > 0).
	From, To, Step float64
	// Arc, Line, NearField: the side of the jet. Azimuth about the axis
	// (geometry's convention: 0 horizontal left looking downstream, π/2 up).
	// When Height is set (HasHeight), the arc or line is horizontal at that
	// height on the side Azimuth points to (left for 0, right for π).
	Azimuth   float64
	Height    float64
	HasHeight bool

	// Line: lateral offset from the jet axis; stations from XFrom to XTo
	// every Spacing, or, when Spacing is 0, at polar angles From..To by Step
	// seen from CenterX on the axis.
	Offset float64
	XFrom  float64
	XTo    float64
	// Spacing between stations along a Line or NearField line, m.
	Spacing float64
	// NearField: clearance from the predicted plume edge, m.
	Clearance float64

	// Ring: axial distance RingX and distance from the axis Radius;
	// azimuths AzFrom to AzTo by AzStep (rad; a full turn omits the repeat).
	RingX                float64
	AzFrom, AzTo, AzStep float64
	FullTurn             bool

	// Points and Probes.
	Fixed []Fixed

	// Microphone is the microphone the array uses; nil: the stand's, or none named.
	Microphone *acoustics.Microphone
}

// SheetOptions are the layout's wishes for the printed sheet.
type SheetOptions struct {
	Scale int    // scale denominator, 0 = the largest standard scale that fits
	Paper string // "A4", "A3", "Letter", "Tabloid"; "" = A3
}

// Request is everything the planner needs, in SI units, as decoded and
// validated by the layout package.
type Request struct {
	Source string // layout file name, for messages and the sheet
	// LengthUnit is the unit the layout reads bare lengths in ("m", "mm",
	// "cm", "in", "ft"), for companion files such as as-built positions;
	// the planner does not use it.
	LengthUnit string
	Title      Title
	Units      units.System
	Convention Convention
	Ambient    Ambient
	Cell       geometry.Cell
	CutOff     float64 // lower cut-off frequency of the wall treatment, Hz; 0 if none
	Nozzle     jet.Nozzle
	Exit       geometry.JetFrame
	Points     []jet.Condition // operating points; their Ambient is overwritten with Ambient
	Limits     Limits
	Band       Band
	Stands     []Stand
	Arrays     []Array
	Sheet      SheetOptions
	// Noise is the room's acoustics and the contours to draw.
	Noise Noise
	// Crew are the places where people stay during runs.
	Crew []Crew
	// Anchor places the cell's datum on the Earth for the GeoJSON export;
	// nil when the layout gives none (the export is then in the cell frame).
	// The planner does not use it.
	Anchor *geometry.Anchor
	// AsBuilt replaces planned positions by measured ones, by station ID:
	// the check command's as-built positions. Every key must name a
	// station of the plan.
	AsBuilt map[string]Placement
	// Notes are the warnings found while reading the layout, each with its
	// file, line and key; the plan's warnings repeat them first, so that
	// plan, check, the exports, the sheet and the preview show what
	// validate shows.
	Notes []string
}

// Placement is a measured station position.
type Placement struct {
	Mic  r3.Vec     // microphone (or probe tip), cell frame, m
	Base *orb.Point // stand pole in plan, m; nil: derived from Mic as planned
}

// System returns the units to print lengths in; the zero Units means
// metric.
func (r *Request) System() units.System {
	if r.Units == units.Imperial {
		return units.Imperial
	}
	return units.Metric
}

// Stand returns the stand type named name.
func (r *Request) Stand(name string) (Stand, bool) {
	for _, s := range r.Stands {
		if s.Name == name {
			return s, true
		}
	}
	return Stand{}, false
}

// JetAmbient returns the ambient the jet model uses.
func (a Ambient) JetAmbient() jet.Ambient {
	return jet.Ambient{Pressure: a.Pressure, Temperature: a.Temperature}
}

// Count returns the number of stations the array asks for, before ring
// azimuths outside the room are left out.
func (a Array) Count() int {
	switch a.Kind {
	case Arc:
		return len(steps(a.From, a.To, a.Step))
	case Line:
		if a.Spacing > 0 {
			return len(steps(a.XFrom, a.XTo, a.Spacing))
		}
		return len(steps(a.From, a.To, a.Step))
	case NearField:
		return len(steps(a.XFrom, a.XTo, a.Spacing))
	case Ring:
		return len(steps(a.AzFrom, a.AzTo, a.AzStep))
	}
	return len(a.Fixed)
}
