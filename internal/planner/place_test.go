package planner

import (
	"math"
	"strings"
	"testing"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/units"
)

// room returns a plain request: an empty square hard-walled room of side
// size (m) with the nozzle at its centre, 1.5 m up, pointing +X, one cold
// 25 mm jet, and the given arrays.
func room(size float64, arrays ...Array) *Request {
	return &Request{
		Source:     "test",
		Units:      units.Metric,
		Convention: FromJetAxis,
		Ambient:    Ambient{Pressure: 101325, Temperature: 293.15, Humidity: 70},
		Cell: geometry.Cell{
			Kind:     geometry.HardWalled,
			Boundary: orb.Ring{{0, 0}, {size, 0}, {size, size}, {0, size}, {0, 0}},
			Ceiling:  5,
			Floor:    geometry.Treated,
		},
		Nozzle: jet.Nozzle{Kind: jet.Convergent, Diameter: 0.025},
		Exit:   geometry.JetFrame{Exit: r3.Vec{X: size / 2, Y: size / 2, Z: 1.5}},
		Points: []jet.Condition{{Name: "cold", Primary: jet.Stream{NPR: 1.3, TemperatureRatio: 1}}},
		Limits: Limits{WallClearance: 0.5},
		Band:   Band{Low: 500, High: 20000},
		Stands: []Stand{
			{Name: "post", BaseRadius: 0.2, BaseHeight: 0.1, PoleDiameter: 0.02},
			{Name: "boom", BaseRadius: 0.2, BaseHeight: 0.1, PoleDiameter: 0.02, BoomLength: 0.3},
		},
		Arrays: arrays,
	}
}

func mustPlan(t *testing.T, req *Request) *Plan {
	t.Helper()
	p, err := New(req)
	if err != nil {
		t.Fatal(err)
	}
	return p
}

func closeVec(a, b r3.Vec, tol float64) bool {
	return math.Abs(a.X-b.X) <= tol && math.Abs(a.Y-b.Y) <= tol && math.Abs(a.Z-b.Z) <= tol
}

// TestArcPlacement checks arc stations, stand bases, IDs and channels
// against hand-computed positions, for a jet pointing +Y (heading 90°).
func TestArcPlacement(t *testing.T) {
	req := room(10, Array{Name: "A", Kind: Arc, Stand: "boom", FirstChannel: 5, CenterX: 0.5, Radius: 2,
		From: deg(150), To: deg(30), Step: deg(60)})
	req.Convention = FromInlet
	req.Exit.Heading = math.Pi / 2
	p := mustPlan(t, req)
	// hand-computed: the axis is +Y, the jet's left is −X; the centre is
	// (5, 5.5, 1.5); θi 150° is θj 30°: (5 − 2 sin30°, 5.5 + 2 cos30°)
	want := []struct {
		id   string
		ch   int
		mic  r3.Vec
		base r3.Vec // boom 0.3 m further from the centre
	}{
		{"A-01", 5, r3.Vec{X: 4, Y: 5.5 + math.Sqrt(3), Z: 1.5}, r3.Vec{X: 5 - 2.3*0.5, Y: 5.5 + 2.3*math.Sqrt(3)/2}},
		{"A-02", 6, r3.Vec{X: 3, Y: 5.5, Z: 1.5}, r3.Vec{X: 2.7, Y: 5.5}},
		{"A-03", 7, r3.Vec{X: 4, Y: 5.5 - math.Sqrt(3), Z: 1.5}, r3.Vec{X: 5 - 2.3*0.5, Y: 5.5 - 2.3*math.Sqrt(3)/2}},
	}
	if len(p.Stations) != len(want) {
		t.Fatalf("got %d stations, want %d", len(p.Stations), len(want))
	}
	for i, w := range want {
		s := p.Stations[i]
		if s.ID != w.id || s.Channel != w.ch {
			t.Errorf("station %d: got %s ch %d, want %s ch %d", i, s.ID, s.Channel, w.id, w.ch)
		}
		if !closeVec(s.Mic, w.mic, 1e-9) {
			t.Errorf("%s: got mic %v, want %v", s.ID, s.Mic, w.mic)
		}
		if math.Abs(s.Base[0]-w.base.X) > 1e-9 || math.Abs(s.Base[1]-w.base.Y) > 1e-9 {
			t.Errorf("%s: got base %v, want %v", s.ID, s.Base, w.base)
		}
		if math.Abs(s.Radius-2) > 1e-9 {
			t.Errorf("%s: got radius %g, want 2", s.ID, s.Radius)
		}
		if wantPolar := deg(150) - deg(60)*float64(i); math.Abs(s.Polar-wantPolar) > 1e-9 {
			t.Errorf("%s: got polar %g°, want %g° (from the inlet)", s.ID, s.Polar*180/math.Pi, wantPolar*180/math.Pi)
		}
	}
}

// TestAutoRadius checks the automatic radius in a 10 m square room with the
// nozzle at the centre (hand-computed): at θj = 0° and 90° the base must
// stay 0.5 m (wall clearance) + 0.2 m (base radius) inside the wall, so
// R = 5 − 0.7 = 4.3 m; the diagonals allow more. In an anechoic room the
// quarter wavelength at 500 Hz, 343.2/2000 = 0.1716 m, is below the wall
// clearance and changes nothing; at 100 Hz (0.858 m) it governs:
// R = 5 − 0.858 − 0.2 = 3.942 m.
func TestAutoRadius(t *testing.T) {
	arc := Array{Name: "A", Kind: Arc, Stand: "post", AutoRadius: true, From: 0, To: deg(180), Step: deg(15)}
	for _, tt := range []struct {
		name string
		kind geometry.Kind
		low  float64
		want float64
	}{
		{"hard-walled", geometry.HardWalled, 500, 4.3},
		{"anechoic above the quarter wave", geometry.Anechoic, 500, 4.3},
		{"anechoic, quarter wave governs", geometry.Anechoic, 100, 5 - 343.2/400 - 0.2},
	} {
		t.Run(tt.name, func(t *testing.T) {
			req := room(10, arc)
			req.Cell.Kind = tt.kind
			req.Band.Low = tt.low
			p := mustPlan(t, req)
			a := p.Arrays[0]
			if !a.Auto || math.Abs(a.Radius-tt.want) > 0.0011 {
				t.Errorf("got radius %.4f (auto %v), want %.4f", a.Radius, a.Auto, tt.want)
			}
			if a.Radius > a.MaxRadius {
				t.Errorf("radius %g above the room's %g", a.Radius, a.MaxRadius)
			}
			for _, s := range p.Stations {
				if c, _ := s.Check(CheckWall); c.Verdict == Blocked {
					t.Errorf("%s blocked by the wall at the automatic radius: %s", s.ID, c.Reason)
				}
			}
		})
	}
}

// TestLineAndRing checks sideline spacing, polar-stepped lines and the
// clipping of ring stations below the floor (hand-computed).
func TestLineAndRing(t *testing.T) {
	req := room(10,
		Array{Name: "S", Kind: Line, Stand: "post", Offset: 2, XFrom: 0, XTo: 1, Spacing: 0.5},
		Array{Name: "L", Kind: Line, Stand: "post", Offset: 2, From: deg(45), To: deg(135), Step: deg(45)},
		Array{Name: "R", Kind: Ring, Stand: "post", RingX: 1, Radius: 2, AzFrom: 0, AzTo: deg(270), AzStep: deg(90), FullTurn: true},
	)
	p := mustPlan(t, req)
	ids := []string{}
	for _, s := range p.Stations {
		ids = append(ids, s.ID)
	}
	if got := strings.Join(ids, " "); got != "S-01 S-02 S-03 L-01 L-02 L-03 R-01 R-02 R-03" {
		t.Fatalf("got stations %s", got)
	}
	want := map[string]r3.Vec{
		"S-02": {X: 5.5, Y: 7, Z: 1.5},
		"L-01": {X: 7, Y: 7, Z: 1.5}, // θj 45°: x = 2/tan 45° = 2
		"L-02": {X: 5, Y: 7, Z: 1.5},
		"L-03": {X: 3, Y: 7, Z: 1.5},
		"R-02": {X: 6, Y: 5, Z: 3.5}, // azimuth 90°: overhead
		"R-03": {X: 6, Y: 3, Z: 1.5}, // azimuth 180°: right
	}
	for _, s := range p.Stations {
		if w, ok := want[s.ID]; ok && !closeVec(s.Mic, w, 1e-9) {
			t.Errorf("%s: got %v, want %v", s.ID, s.Mic, w)
		}
	}
	notes := strings.Join(p.Arrays[2].Notes, " ")
	if !strings.Contains(notes, "1 of the ring's azimuths") {
		t.Errorf("ring notes %q: want the station below the floor reported", notes)
	}
}

// TestNearFieldLine checks that every microphone of a near-field line keeps
// at least its clearance from the widest conservative velocity zone.
func TestNearFieldLine(t *testing.T) {
	req := room(10, Array{Name: "N", Kind: NearField, Stand: "post", Clearance: 0.3, XFrom: 0.05, XTo: 1.0, Spacing: 0.1})
	req.Points = append(req.Points, jet.Condition{Name: "fast", Primary: jet.Stream{NPR: 2.5, TotalTemperature: 600}})
	p := mustPlan(t, req)
	if len(p.Stations) != 10 {
		t.Fatalf("got %d stations, want 10", len(p.Stations))
	}
	for _, s := range p.Stations {
		for _, pt := range p.Points {
			e := pt.Velocity()
			if c := e.Clearance(s.Jet.X, s.Jet.R); c < 0.3-1e-9 {
				t.Errorf("%s: microphone %.4f m from the zone of %s, want ≥ 0.3", s.ID, c, pt.Name)
			}
		}
	}
}

// TestAsBuilt checks that measured positions replace planned ones and that
// an unknown station is an error.
func TestAsBuilt(t *testing.T) {
	req := room(10, Array{Name: "A", Kind: Arc, Stand: "post", Radius: 2, From: deg(90), To: deg(90), Step: deg(10)})
	req.AsBuilt = map[string]Placement{"A-01": {Mic: r3.Vec{X: 5.1, Y: 7.2, Z: 1.4}}}
	p := mustPlan(t, req)
	if s := p.Stations[0]; !closeVec(s.Mic, r3.Vec{X: 5.1, Y: 7.2, Z: 1.4}, 0) {
		t.Errorf("got %v, want the as-built position", s.Mic)
	}
	req.AsBuilt["Z-9"] = Placement{}
	if _, err := New(req); err == nil || !strings.Contains(err.Error(), "Z-9") {
		t.Errorf("got %v, want an error naming Z-9", err)
	}
}
