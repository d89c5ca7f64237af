package export_test

import (
	"math"
	"sync"
	"testing"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/acoustics"
	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/planner"
	"arcwright/internal/units"
)

// The fixture is a hand-made plan: a 2-inch model jet in a 27 m × 12 m
// anechoic chamber with a hard floor, two operating points predicted by
// jet.NewPlume, a three-microphone arc at 3 m (90°, 120° and 150° from the
// inlet), a flush floor microphone and a probe stand inside the jet. The
// check values of the zones and the wall are computed from the real
// envelopes and cell; the others, the verdicts and the array summaries are
// set by hand (this package formats them; the planner decides them).

const deg = math.Pi / 180

// fixtureFrame puts the nozzle exit 1.5 m above the datum, pointing +X.
var fixtureFrame = geometry.JetFrame{Exit: r3.Vec{X: 0, Y: 0, Z: 1.5}, Heading: 0}

var (
	fixtureOnce sync.Once
	fixtureBase *planner.Plan
	fixtureErr  error
)

// fixturePlan returns a fresh copy of the fixture: its station, array and
// point lists may be changed by the caller.
func fixturePlan(tb testing.TB) *planner.Plan {
	tb.Helper()
	fixtureOnce.Do(func() { fixtureBase, fixtureErr = buildFixture() })
	if fixtureErr != nil {
		tb.Fatalf("building the fixture: %v", fixtureErr)
	}
	p := *fixtureBase
	p.Stations = append([]planner.Station(nil), p.Stations...)
	for i := range p.Stations {
		p.Stations[i].Checks = append([]planner.Check(nil), p.Stations[i].Checks...)
	}
	p.Arrays = append([]planner.ArrayResult(nil), p.Arrays...)
	p.Points = append([]planner.PointResult(nil), p.Points...)
	req := *p.Request
	p.Request = &req
	return &p
}

func fixtureRequest() *planner.Request {
	boom := planner.Stand{Name: "boom tripod", BaseRadius: 0.35, BaseHeight: 0.05, PoleDiameter: 0.04, BoomLength: 0.3}
	probe := planner.Stand{Name: "probe mast", BaseRadius: 0.3, BaseHeight: 0.05, PoleDiameter: 0.05, BoomLength: 0.5}
	return &planner.Request{
		Source: "layouts/model-jet.yaml",
		Title: planner.Title{
			Title: "Model jet far-field arc", Facility: "Chamber B", Test: "cold and hot NPR sweep",
			Revision: "A", PreparedBy: "J. Engineer", Date: "2025-03-14",
		},
		Units:      units.Metric,
		Convention: planner.FromInlet,
		Ambient:    planner.Ambient{Pressure: 101325, Temperature: 288.15, Humidity: 60},
		Cell: geometry.Cell{
			Kind:     geometry.Anechoic,
			Boundary: orb.Ring{{-3, -6}, {24, -6}, {24, 6}, {-3, 6}, {-3, -6}},
			Ceiling:  8,
			Floor:    geometry.Hard,
			Obstacles: []geometry.Obstacle{
				{Name: "nozzle rig", Footprint: geometry.Polygon(orb.Ring{{-2.5, -0.5}, {-0.2, -0.5}, {-0.2, 0.5}, {-2.5, 0.5}}), ZMin: 0, ZMax: 1.7},
				{Name: "camera stand", Footprint: geometry.Circle(orb.Point{0.45, 2}, 0.15), ZMin: 0, ZMax: 1.8},
			},
			KeepOuts: []geometry.KeepOut{
				{Name: "door swing", Footprint: geometry.Polygon(orb.Ring{{20, 4.5}, {23, 4.5}, {23, 6}, {20, 6}})},
			},
			Collector: &geometry.Collector{Inlet: r3.Vec{X: 22, Y: 0, Z: 1.5}, Diameter: 2.5, Heading: 0},
			Marks:     []geometry.Mark{{Name: "datum", At: orb.Point{0, 0}}, {Name: "A1", At: orb.Point{10, 0}}},
		},
		Nozzle: jet.Nozzle{Kind: jet.Convergent, Diameter: 0.0508},
		Exit:   fixtureFrame,
		Points: []jet.Condition{
			{Name: "cold NPR 1.6", Primary: jet.Stream{NPR: 1.6, TemperatureRatio: 1}},
			{Name: "hot NPR 1.8", Primary: jet.Stream{NPR: 1.8, TotalTemperature: 800}},
		},
		Limits: planner.DefaultLimits(),
		Band:   planner.Band{Low: 200, High: 20000},
		Stands: []planner.Stand{boom, probe},
		Arrays: []planner.Array{
			{Name: "far", Kind: planner.Arc, Stand: "boom tripod", FirstChannel: 1, Radius: 3, From: 90 * deg, To: 150 * deg, Step: 30 * deg},
			{Name: "ref", Kind: planner.Points, Fixed: []planner.Fixed{{Name: "floor", At: r3.Vec{X: 2, Y: 4, Z: 0}, Channel: 4}}},
			{Name: "rake", Kind: planner.Probes, Stand: "probe mast", Fixed: []planner.Fixed{{Name: "pitot", At: r3.Vec{X: 0.6, Y: 0.05, Z: 1.5}}}},
		},
	}
}

func buildFixture() (*planner.Plan, error) {
	req := fixtureRequest()
	plan := &planner.Plan{Request: req}
	for _, c := range req.Points {
		c.Ambient = req.Ambient.JetAmbient()
		pl, err := jet.NewPlume(req.Nozzle, c, jet.DefaultLimits())
		if err != nil {
			return nil, err
		}
		plan.Points = append(plan.Points, planner.PointResult{
			Name: c.Name, Condition: c, Plume: pl, Exit: pl.Exit(),
			CoreNominal: pl.CoreLength(jet.Nominal), CoreConservative: pl.CoreLength(jet.Conservative),
			SourceEnd: 1.5, // hand-set
			Capture:   planner.OK, CaptureReason: "plume inside the 2.5 m collector inlet 22 m downstream (hand-set)",
			CaptureDiameter: 2.1 + 0.2*float64(len(plan.Points)), // hand-set
			Flags:           pl.Flags(),
		})
	}
	for i := range plan.Points {
		if plan.Points[i].Velocity().Length > plan.Points[plan.Governing].Velocity().Length {
			plan.Governing = i
		}
		if plan.Points[i].Hot().Length > plan.Points[plan.GoverningHot].Hot().Length {
			plan.GoverningHot = i
		}
	}
	boom, probe := &req.Stands[0], &req.Stands[1]

	// the arc: 3 m about the exit, on the jet's left in the horizontal
	// plane through the axis; the boom puts the pole 0.3 m further out
	for i, thetaI := range []float64{90 * deg, 120 * deg, 150 * deg} {
		thetaJ := req.Convention.ToDownstream(thetaI)
		mic := fixtureFrame.ToCell(geometry.JetPoint{X: 3 * math.Cos(thetaJ), R: 3 * math.Sin(thetaJ)})
		out := r3.Unit(r3.Vec{X: mic.X, Y: mic.Y})
		base := orb.Point{mic.X + 0.3*out.X, mic.Y + 0.3*out.Y}
		s := station(plan, "far-"+string(rune('1'+i)), "far", planner.Arc, i+1, i+1, mic, base, boom)
		s.Radius, s.Nominal = 3, thetaI
		plan.Stations = append(plan.Stations, s)
	}
	// far-1 sees part of the source region behind the camera stand
	setCheck(&plan.Stations[0], planner.Check{Name: planner.CheckSight, Value: 0.6, Verdict: planner.Warn,
		Point: plan.Points[plan.Governing].Name, Reason: `obstacle "camera stand" hides 40 % of the source region`})

	ref := station(plan, "ref-1", "ref", planner.Points, 1, 4, r3.Vec{X: 2, Y: 4, Z: 0}, orb.Point{2, 4}, nil)
	setCheck(&ref, planner.Check{Name: planner.CheckGround, Value: math.NaN(), Unit: "Hz", Verdict: planner.OK,
		Point: plan.Points[plan.Governing].Name, Reason: "flush on the floor: no null; the level is doubled (subtract 6 dB)"})
	plan.Stations = append(plan.Stations, ref)

	// the probe tip sits in the core, on the mast's 0.5 m boom
	rake := station(plan, "rake-1", "rake", planner.Probes, 1, 0, r3.Vec{X: 0.6, Y: 0.05, Z: 1.5}, orb.Point{0.6, 0.55}, probe)
	rake.Checks = rake.Checks[:3] // zones and wall only: no acoustic checks on a probe
	plan.Stations = append(plan.Stations, rake)

	for i := range plan.Stations {
		finish(&plan.Stations[i])
		switch plan.Stations[i].Status {
		case planner.OK:
			plan.OK++
		case planner.Warn:
			plan.Warn++
		case planner.Blocked:
			plan.Blocked++
		}
	}

	dj := plan.Points[plan.Governing].Exit.FullyExpandedDiameter
	plan.Arrays = []planner.ArrayResult{
		{Name: "far", Kind: planner.Arc, Spec: req.Arrays[0], Centre: fixtureFrame.Exit, Radius: 3,
			MaxRadius: 5.4, FarField: [2]float64{50 * dj, 5.4}, FarFieldNote: "from 50 Dj to the largest arc the chamber allows",
			MinClearPolar: 160 * deg, Stations: 3},
		{Name: "ref", Kind: planner.Points, Spec: req.Arrays[1], Centre: fixtureFrame.Exit,
			FarField: [2]float64{1, 0}, FarFieldNote: "the far-field interval is given for arcs", MinClearPolar: math.NaN(), Stations: 1},
		{Name: "rake", Kind: planner.Probes, Spec: req.Arrays[2], Centre: fixtureFrame.Exit,
			FarField: [2]float64{1, 0}, FarFieldNote: "the far-field interval is given for arcs", MinClearPolar: math.NaN(),
			Blocked: []string{"rake-1: " + plan.Stations[4].Reasons[0]}, Stations: 1},
	}

	atm := acoustics.Atmosphere{Temperature: 288.15, RelativeHumidity: 60, Pressure: 101325}
	for _, n := range []int{30, 40, 43} { // 1 kHz, 10 kHz, 20 kHz
		b := acoustics.NewBand(n)
		a := atm.Absorption(b.Centre)
		plan.Absorption = append(plan.Absorption, planner.AbsorptionRow{Band: b, PerM: a,
			ArrayDB: []float64{3 * a, plan.Stations[3].Radius * a, plan.Stations[4].Radius * a}})
	}
	plan.Warnings = []string{"the absorption table assumes 60 % relative humidity"}
	return plan, nil
}

// station places a station at mic with the zone, wall and acoustic checks
// of the fixture; Status, Governing and Reasons are set by finish.
func station(plan *planner.Plan, id, array string, kind planner.ArrayKind, index, channel int, mic r3.Vec, base orb.Point, stand *planner.Stand) planner.Station {
	req := plan.Request
	q := fixtureFrame.ToJet(mic)
	s := planner.Station{
		ID: id, Array: array, Kind: kind, Index: index, Channel: channel,
		Mic: mic, Base: base, Stand: stand, Jet: q,
		Radius: q.Distance(), Polar: req.Convention.FromDownstream(q.Polar()), Nominal: math.NaN(),
		Height: mic.Z, Incidence: planner.NormalIncidence, AimAt: fixtureFrame.Exit,
	}
	if stand == nil {
		s.Incidence = planner.GrazingIncidence
	}
	for _, z := range []struct {
		name string
		env  func(*planner.PointResult) *jet.Envelope
	}{{planner.CheckVelocity, (*planner.PointResult).Velocity}, {planner.CheckHot, (*planner.PointResult).Hot}} {
		c := planner.Check{Name: z.name, Value: math.Inf(1), Unit: "m"}
		for i := range plan.Points {
			if v := z.env(&plan.Points[i]).Clearance(q.X, q.R); v < c.Value {
				c.Value, c.Point = v, plan.Points[i].Name
			}
		}
		switch {
		case c.Value < 0:
			c.Verdict, c.Reason = planner.Blocked, "inside the "+z.name[:len(z.name)-len("_clearance")]+" zone of "+c.Point
		case c.Value < req.Limits.Margin:
			c.Verdict, c.Reason = planner.Blocked, "within the margin of the zone of "+c.Point
		default:
			c.Verdict, c.Reason = planner.OK, "clear of the zone of "+c.Point
		}
		s.Checks = append(s.Checks, c)
	}
	s.Checks = append(s.Checks, planner.Check{Name: planner.CheckWall, Value: req.Cell.WallDistance(s.Base), Unit: "m",
		Verdict: planner.OK, Reason: "inside the wedge tips"})

	dj := plan.Points[plan.Governing].Exit.FullyExpandedDiameter
	refl := acoustics.FloorReflection(fixtureFrame.Exit.Z, mic.Z, math.Hypot(mic.X, mic.Y))
	c := acoustics.StandardAtmosphere().SpeedOfSound()
	gov := plan.Points[plan.Governing].Name
	ground := planner.Check{Name: planner.CheckGround, Value: refl.NullFrequency(0, c), Unit: "Hz", Verdict: planner.OK, Point: gov, Reason: "first floor null outside the band"}
	if _, in := acoustics.FirstNullInBand(refl, c, req.Band.Low, req.Band.High); in {
		ground.Verdict, ground.Reason = planner.Warn, "floor-reflection null inside the band"
	}
	s.Checks = append(s.Checks,
		planner.Check{Name: planner.CheckSight, Value: 1, Verdict: planner.OK, Point: gov, Reason: "source region in full view"},
		planner.Check{Name: planner.CheckFarField, Value: s.Radius / dj, Unit: "Dj", Verdict: planner.OK, Point: gov, Reason: "far enough"},
		ground,
		planner.Check{Name: planner.CheckAbsorption, Value: 0.2 * s.Radius, Unit: "dB", Verdict: planner.OK, Reason: "small"},
	)
	return s
}

// setCheck replaces the check of the same name.
func setCheck(s *planner.Station, c planner.Check) {
	for i := range s.Checks {
		if s.Checks[i].Name == c.Name {
			s.Checks[i] = c
			return
		}
	}
	s.Checks = append(s.Checks, c)
}

// finish sets the station's status to its worst verdict, its governing
// point to that check's point, and its reasons to the checks that are not
// OK, worst first.
func finish(s *planner.Station) {
	s.Status, s.Governing, s.Reasons = planner.OK, "", nil
	for _, v := range []planner.Verdict{planner.Blocked, planner.Warn} {
		for _, c := range s.Checks {
			if c.Verdict != v {
				continue
			}
			if s.Status == planner.OK {
				s.Status, s.Governing = v, c.Point
			}
			s.Reasons = append(s.Reasons, c.Reason)
		}
	}
}
