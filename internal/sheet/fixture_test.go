package sheet_test

import (
	"fmt"
	"math"
	"testing"
	"time"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/acoustics"
	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/planner"
	"arcwright/internal/units"
)

// Hand-made plans stand in for the planner's output. The plumes are real
// jet.NewPlume predictions; the clearances and verdicts are worked out here
// from those envelopes in the simplest way (microphone point against each
// operating point's conservative zones, stand base against the wall), which
// is enough to give the sheet realistic ok, warn and blocked stations.

// fixedClock is the clock of every test: 2025-03-14 09:30 UTC.
func fixedClock() time.Time { return time.Date(2025, 3, 14, 9, 30, 0, 0, time.UTC) }

// deg converts degrees to radians.
func deg(d float64) float64 { return d * math.Pi / 180 }

// builder of a fixture plan.
type fixture struct {
	t    testing.TB
	plan *planner.Plan
	ch   int
}

// newFixture starts a plan with the request req and predicts the plume of
// each condition.
func newFixture(t testing.TB, req *planner.Request) *fixture {
	t.Helper()
	p := &planner.Plan{Request: req}
	lim := jet.Limits{Velocity: req.Limits.Velocity, Temperature: req.Limits.Temperature}
	best, hottest := -1.0, 0.0
	for i, c := range req.Points {
		c.Ambient = req.Ambient.JetAmbient()
		pl, err := jet.NewPlume(req.Nozzle, c, lim)
		if err != nil {
			t.Fatalf("fixture point %s: %v", c.Name, err)
		}
		pr := planner.PointResult{
			Name: c.Name, Condition: c, Plume: pl, Exit: pl.Exit(),
			CoreNominal: pl.CoreLength(jet.Nominal), CoreConservative: pl.CoreLength(jet.Conservative),
			SourceEnd: pl.CoreLength(jet.Conservative), Flags: pl.Flags(),
		}
		if col := req.Cell.Collector; col != nil {
			x := r3.Dot(r3.Sub(col.Inlet, req.Exit.Exit), req.Exit.Axis())
			d := 2 * pl.Envelope(jet.VelocityZone, jet.Conservative).Radius(x)
			pr.CaptureDiameter = d
			if d <= col.Diameter {
				pr.Capture, pr.CaptureReason = planner.OK, fmt.Sprintf("velocity zone %.2f m wide at the inlet, inlet %.2f m", d, col.Diameter)
			} else {
				pr.Capture, pr.CaptureReason = planner.Warn, fmt.Sprintf("velocity zone %.2f m wide at the inlet is wider than the inlet (%.2f m)", d, col.Diameter)
			}
		}
		p.Points = append(p.Points, pr)
		if l := pl.Envelope(jet.VelocityZone, jet.Conservative).Length; l > best {
			best, p.Governing = l, i
		}
		if l := pl.Envelope(jet.HotZone, jet.Conservative).Length; l > hottest {
			hottest, p.GoverningHot = l, i
		}
	}
	return &fixture{t: t, plan: p}
}

// station adds one station.
func (f *fixture) station(ar *planner.ArrayResult, idx int, mic r3.Vec, base orb.Point, stand *planner.Stand, polar, nominal float64, inc planner.Incidence) {
	req := f.plan.Request
	f.ch++
	ch := f.ch
	if ar.Kind == planner.Probes {
		ch = 0
	}
	s := planner.Station{
		ID: fmt.Sprintf("%s-%02d", ar.Name, idx), Array: ar.Name, Kind: ar.Kind, Index: idx, Channel: ch,
		Mic: mic, Base: base, Stand: stand, Jet: req.Exit.ToJet(mic), Radius: ar.Radius, Polar: polar, Nominal: nominal,
		Height: mic.Z, Incidence: inc, AimAt: req.Exit.Exit,
	}
	if ar.Kind != planner.Arc {
		s.Radius = s.Jet.Distance()
	}
	f.plan.Stations = append(f.plan.Stations, s)
	ar.Stations++
}

// arc adds an arc of stations at polar angles from..to by step (degrees,
// layout convention) about a centre cx downstream of the exit, horizontal
// at the axis height on the left (side 0) or right (side π) of the jet.
func (f *fixture) arc(name string, cx, radius, from, to, step, side float64, stand *planner.Stand) {
	req := f.plan.Request
	fr := req.Exit
	c := fr.ToCell(geometry.JetPoint{X: cx})
	ar := planner.ArrayResult{Name: name, Kind: planner.Arc, Centre: c, Radius: radius, MaxRadius: radius * 1.2,
		FarField: [2]float64{radius * 0.6, radius * 1.2}, MinClearPolar: math.NaN(),
		Spec: planner.Array{Name: name, Kind: planner.Arc, CenterX: cx, Radius: radius, From: deg(from), To: deg(to), Step: deg(step), Azimuth: side}}
	n := int(math.Round((to-from)/step)) + 1
	for i := 0; i < n; i++ {
		th := deg(from + float64(i)*step)
		tj := req.Convention.ToDownstream(th)
		mic := fr.ToCell(geometry.JetPoint{X: cx + radius*math.Cos(tj), R: radius * math.Sin(tj), Azimuth: side})
		base := orb.Point{mic.X, mic.Y}
		if stand != nil && stand.BoomLength > 0 {
			d := math.Hypot(mic.X-c.X, mic.Y-c.Y)
			base = orb.Point{mic.X + stand.BoomLength*(mic.X-c.X)/d, mic.Y + stand.BoomLength*(mic.Y-c.Y)/d}
		}
		f.station(&ar, i+1, mic, base, stand, th, th, planner.NormalIncidence)
	}
	f.plan.Arrays = append(f.plan.Arrays, ar)
}

// line adds a sideline at offset (m) on side from x0 to x1 every spacing
// (m, along the axis), at the axis height.
func (f *fixture) line(name string, offset, x0, x1, spacing, side float64, stand *planner.Stand, inc planner.Incidence) {
	req := f.plan.Request
	fr := req.Exit
	ar := planner.ArrayResult{Name: name, Kind: planner.Line, Centre: fr.Exit, Radius: offset, MinClearPolar: math.NaN(),
		Spec: planner.Array{Name: name, Kind: planner.Line, Offset: offset, XFrom: x0, XTo: x1, Spacing: spacing, Azimuth: side, Incidence: inc}}
	i := 0
	for x := x0; x <= x1+1e-9; x += spacing {
		i++
		mic := fr.ToCell(geometry.JetPoint{X: x, R: offset, Azimuth: side})
		base := orb.Point{mic.X, mic.Y}
		if stand != nil && stand.BoomLength > 0 {
			out := fr.ToCell(geometry.JetPoint{X: x, R: offset + stand.BoomLength, Azimuth: side})
			base = orb.Point{out.X, out.Y}
		}
		q := req.Exit.ToJet(mic)
		f.station(&ar, i, mic, base, stand, req.Convention.FromDownstream(q.Polar()), math.NaN(), inc)
	}
	f.plan.Arrays = append(f.plan.Arrays, ar)
}

// ring adds a full ring of n stations at x (m) downstream, radius r.
func (f *fixture) ring(name string, x, r float64, n int) {
	req := f.plan.Request
	fr := req.Exit
	ar := planner.ArrayResult{Name: name, Kind: planner.Ring, Centre: fr.ToCell(geometry.JetPoint{X: x}), Radius: r, MinClearPolar: math.NaN(),
		Spec: planner.Array{Name: name, Kind: planner.Ring, RingX: x, Radius: r, AzFrom: 0, AzTo: 2 * math.Pi, AzStep: 2 * math.Pi / float64(n), FullTurn: true}}
	for i := 0; i < n; i++ {
		mic := fr.ToCell(geometry.JetPoint{X: x, R: r, Azimuth: 2 * math.Pi * float64(i) / float64(n)})
		q := req.Exit.ToJet(mic)
		f.station(&ar, i+1, mic, orb.Point{mic.X, mic.Y}, nil, req.Convention.FromDownstream(q.Polar()), math.NaN(), planner.GrazingIncidence)
	}
	f.plan.Arrays = append(f.plan.Arrays, ar)
}

// probe adds a probe stand checked at p.
func (f *fixture) probe(name string, p r3.Vec, stand *planner.Stand) {
	req := f.plan.Request
	ar := planner.ArrayResult{Name: name, Kind: planner.Probes, Centre: req.Exit.Exit, MinClearPolar: math.NaN()}
	q := req.Exit.ToJet(p)
	f.station(&ar, 1, p, orb.Point{p.X, p.Y}, stand, req.Convention.FromDownstream(q.Polar()), math.NaN(), planner.NormalIncidence)
	f.plan.Arrays = append(f.plan.Arrays, ar)
}

// finish works out every station's checks and verdict, the counts and the
// absorption table.
func (f *fixture) finish() *planner.Plan {
	p := f.plan
	req := p.Request
	margin := req.Limits.Margin
	for i := range p.Stations {
		s := &p.Stations[i]
		worst := planner.OK
		var reasons []string
		add := func(name string, v float64, vd planner.Verdict, point, reason string) {
			s.Checks = append(s.Checks, planner.Check{Name: name, Value: v, Unit: "m", Verdict: vd, Point: point, Reason: reason})
			if vd > worst {
				worst, s.Governing = vd, point
			}
			if vd != planner.OK {
				reasons = append(reasons, reason)
			}
		}
		for _, z := range []struct {
			name string
			zone jet.Zone
			word string
		}{{planner.CheckVelocity, jet.VelocityZone, "velocity zone"}, {planner.CheckHot, jet.HotZone, "hot zone"}} {
			best, at := math.Inf(1), ""
			for _, pt := range p.Points {
				if c := pt.Plume.Envelope(z.zone, jet.Conservative).Clearance(s.Jet.X, s.Jet.R); c < best {
					best, at = c, pt.Name
				}
			}
			vd := planner.OK
			switch {
			case best < margin:
				vd = planner.Blocked
			case best < 2*margin:
				vd = planner.Warn
			}
			add(z.name, best, vd, at, fmt.Sprintf("%s clearance %.2f m at point %s (margin %.2f m)", z.word, best, at, margin))
		}
		br := 0.0
		if s.Stand != nil {
			br = s.Stand.BaseRadius
		}
		w := req.Cell.WallDistance(s.Base) - br
		vd := planner.OK
		if w < req.Limits.WallClearance {
			vd = planner.Blocked
		}
		add(planner.CheckWall, w, vd, "", fmt.Sprintf("stand base %.2f m from the wall (needs %.2f m)", w, req.Limits.WallClearance))
		if s.Governing == "" {
			s.Governing = p.Points[p.Governing].Name
		}
		s.Status, s.Reasons = worst, reasons
		switch worst {
		case planner.OK:
			p.OK++
		case planner.Warn:
			p.Warn++
		default:
			p.Blocked++
		}
	}
	atm := acoustics.Atmosphere{Temperature: req.Ambient.Temperature, RelativeHumidity: req.Ambient.Humidity, Pressure: req.Ambient.Pressure}
	bands, err := acoustics.ThirdOctaveBands(req.Band.Low, req.Band.High)
	if err != nil {
		f.t.Fatalf("fixture bands: %v", err)
	}
	for _, bd := range bands {
		a := atm.Absorption(bd.Centre)
		row := planner.AbsorptionRow{Band: bd, PerM: a}
		for _, ar := range p.Arrays {
			row.ArrayDB = append(row.ArrayDB, a*math.Max(ar.Radius, 1))
		}
		p.Absorption = append(p.Absorption, row)
	}
	return p
}

// chamberPlan is a model-jet anechoic chamber, metric, polar angles from
// the jet axis: a 2-inch nozzle at three operating points (cold subsonic,
// hot subsonic, cold under-expanded), a 10-station far-field arc, a short
// arc that runs into the plume, a boom-stand sideline, a ring and a probe.
func chamberPlan(t testing.TB) *planner.Plan {
	t.Helper()
	mic := &planner.Stand{Name: "tripod", BaseRadius: 0.3, BaseHeight: 0.1, PoleDiameter: 0.025}
	boom := &planner.Stand{Name: "boom", BaseRadius: 0.25, BaseHeight: 0.1, PoleDiameter: 0.03, BoomLength: 0.4}
	req := &planner.Request{
		Source: "layouts/chamber-a.yaml",
		Title: planner.Title{Title: "Model jet arc survey", Facility: "Chamber A", Test: "MJ-2025-07", Revision: "B",
			PreparedBy: "J. Ortega", Date: "2025-03-10"},
		Units: units.Metric, Convention: planner.FromJetAxis,
		Ambient: planner.Ambient{Pressure: 101325, Temperature: 288.15, Humidity: 60},
		Cell: geometry.Cell{
			Kind:     geometry.Anechoic,
			Boundary: orb.Ring{{-2, -4.5}, {9, -4.5}, {9, 4.5}, {-2, 4.5}, {-2, -4.5}},
			Ceiling:  6, Floor: geometry.Treated, TreatmentDepth: 0.9,
			Obstacles: []geometry.Obstacle{
				{Name: "rig plenum", Footprint: geometry.Polygon(orb.Ring{{-1.9, -0.6}, {-0.2, -0.6}, {-0.2, 0.6}, {-1.9, 0.6}}), ZMin: 0, ZMax: 2},
				{Name: "column", Footprint: geometry.Circle(orb.Point{6, 3.6}, 0.2), ZMin: 0, ZMax: 6},
			},
			KeepOuts:  []geometry.KeepOut{{Name: "door swing", Footprint: geometry.Polygon(orb.Ring{{-2, 3.3}, {-0.8, 3.3}, {-0.8, 4.5}, {-2, 4.5}})}},
			Collector: &geometry.Collector{Inlet: r3.Vec{X: 8.2, Y: 0, Z: 1.5}, Diameter: 1.2, Heading: 0},
			Marks:     []geometry.Mark{{Name: "P1", At: orb.Point{0, 4}}, {Name: "P2", At: orb.Point{8, -4}}},
		},
		Nozzle: jet.Nozzle{Kind: jet.Convergent, Diameter: 0.0508},
		Exit:   geometry.JetFrame{Exit: r3.Vec{X: 0.5, Y: 0, Z: 1.5}, Heading: 0},
		Points: []jet.Condition{
			{Name: "SP1", Primary: jet.Stream{NPR: 1.5, TemperatureRatio: 1}},
			{Name: "SP7", Primary: jet.Stream{NPR: 1.8, TotalTemperature: 800}},
			{Name: "SP3", Primary: jet.Stream{NPR: 2.5, TemperatureRatio: 1}},
		},
		Limits: planner.DefaultLimits(),
		Band:   planner.Band{Low: 200, High: 80000},
		Stands: []planner.Stand{*mic, *boom},
		Sheet:  planner.SheetOptions{Paper: "A3"},
	}
	f := newFixture(t, req)
	f.arc("A", 0, 3.5, 30, 150, 13.333333333333334, 0, mic)
	f.arc("B", 0.5, 1.2, 10, 40, 10, 0, mic)
	f.line("L", 2.5, 1, 7, 1, math.Pi, boom, planner.GrazingIncidence)
	f.ring("R", 0.8, 0.6, 8)
	f.probe("CAM", r3.Vec{X: 5, Y: -3.9, Z: 1.2}, mic)
	p := f.finish()
	p.Arrays[0].FarFieldNote = "limited by the room"
	p.Arrays[1].Blocked = []string{"polar 10° to 20°: inside the velocity zone of SP7"}
	p.Warnings = []string{"Hot point SP7: the hot zone is drawn conservative; the plenum surface is not checked for heat."}
	return p
}

// padPlan is an outdoor static pad, unbounded, in feet and inches, polar
// angles from the inlet: a full-scale-like exhaust and n stations on four
// arcs and two sidelines, for the crowded-plan tests.
func padPlan(t testing.TB, n int) *planner.Plan {
	t.Helper()
	tri := &planner.Stand{Name: "tripod", BaseRadius: 0.5, BaseHeight: 0.1, PoleDiameter: 0.04}
	req := &planner.Request{
		Source: "layouts/pad-7.yaml",
		Title:  planner.Title{Title: "Pad 7 engine noise survey", Facility: "Static pad 7", Test: "EN-41", Revision: "A"},
		Units:  units.Imperial, Convention: planner.FromInlet,
		Ambient: planner.Ambient{Pressure: 100500, Temperature: 293.15, Humidity: 45},
		Cell: geometry.Cell{
			Kind: geometry.OutdoorPad, Ceiling: math.Inf(1), Floor: geometry.Hard,
			Obstacles: []geometry.Obstacle{{Name: "engine stand", Footprint: geometry.Polygon(orb.Ring{{-6, -2}, {-1, -2}, {-1, 2}, {-6, 2}}), ZMin: 0, ZMax: 4}},
			KeepOuts:  []geometry.KeepOut{{Name: "fuel line", Footprint: geometry.Polygon(orb.Ring{{-18, -14}, {-14, -14}, {-14, -10}, {-18, -10}})}},
			Marks:     []geometry.Mark{{Name: "M1", At: orb.Point{0, -10}}},
		},
		Nozzle: jet.Nozzle{Kind: jet.Convergent, Diameter: 0.6},
		Exit:   geometry.JetFrame{Exit: r3.Vec{X: 0, Y: 0, Z: 2.5}, Heading: 0},
		Points: []jet.Condition{
			{Name: "idle", Primary: jet.Stream{NPR: 1.1, TotalTemperature: 600}},
			{Name: "cruise", Primary: jet.Stream{NPR: 1.5, TotalTemperature: 750}},
		},
		Limits: planner.DefaultLimits(),
		Band:   planner.Band{Low: 50, High: 10000},
		Stands: []planner.Stand{*tri},
	}
	f := newFixture(t, req)
	// four arcs share 80 % of the stations, two sidelines the rest
	perArc := max(2, n/5)
	step := 140.0 / float64(perArc-1)
	f.arc("N", 0, 10, 20, 160, step, 0, tri)
	f.arc("M", 0, 15, 20, 160, step, 0, tri)
	f.arc("F", 0, 20, 20, 160, step, 0, tri)
	f.arc("G", 0, 20, 20, 160, step, math.Pi, tri)
	rest := n - 4*perArc
	perLine := max(2, rest/2)
	f.line("S", 7, 4, 24, 20.0/float64(perLine-1), math.Pi, tri, planner.NormalIncidence)
	f.line("T", 14, 4, 24, 20.0/float64(max(2, rest-perLine)-1), math.Pi, tri, planner.NormalIncidence)
	return f.finish()
}
