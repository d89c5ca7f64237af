package planner

import (
	"math"
	"math/rand/v2"
	"testing"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/units"
)

// randomRequest draws a cell, a jet, a test matrix and arrays.
func randomRequest(rng *rand.Rand) *Request {
	w, l := 8+32*rng.Float64(), 8+32*rng.Float64()
	ceiling := 3 + 7*rng.Float64()
	kind := geometry.Kind(rng.IntN(2)) // anechoic or hard-walled
	d := 0.02 + 0.28*rng.Float64()
	axis := 0.8 + math.Min(ceiling-1.5, 2.5)*rng.Float64()
	exit := r3.Vec{X: 1 + (w-2)*rng.Float64(), Y: 1 + (l-2)*rng.Float64(), Z: axis}
	req := &Request{
		Source:     "random",
		Units:      units.Metric,
		Convention: Convention(1 + rng.IntN(2)),
		Ambient:    Ambient{Pressure: 95e3 + 10e3*rng.Float64(), Temperature: 275 + 30*rng.Float64(), Humidity: 20 + 70*rng.Float64()},
		Cell: geometry.Cell{
			Kind:     kind,
			Boundary: orb.Ring{{0, 0}, {w, 0}, {w, l}, {0, l}, {0, 0}},
			Ceiling:  ceiling,
			Floor:    geometry.Surface(rng.IntN(3)),
		},
		Nozzle: jet.Nozzle{Kind: jet.Convergent, Diameter: d},
		Exit:   geometry.JetFrame{Exit: exit, Heading: 2 * math.Pi * rng.Float64()},
		Band:   Band{Low: 50 + 400*rng.Float64(), High: 5000 + 50000*rng.Float64()},
		Stands: []Stand{
			{Name: "post", BaseRadius: 0.1 + 0.2*rng.Float64(), BaseHeight: 0.1, PoleDiameter: 0.02 + 0.03*rng.Float64()},
			{Name: "boom", BaseRadius: 0.1 + 0.2*rng.Float64(), BaseHeight: 0.1, PoleDiameter: 0.02 + 0.03*rng.Float64(), BoomLength: 0.1 + 0.6*rng.Float64()},
		},
	}
	req.Limits = Limits{Velocity: 2 + 8*rng.Float64(), Margin: 0.05 + 0.45*rng.Float64(), WallClearance: 0.1 + 0.4*rng.Float64()}
	req.Limits.Temperature = req.Ambient.Temperature + 10 + 50*rng.Float64()
	for i := 0; i <= rng.IntN(4); i++ {
		req.Points = append(req.Points, jet.Condition{Name: string(rune('a' + i)),
			Primary: jet.Stream{NPR: 1.05 + 2.5*rng.Float64(), TotalTemperature: 250 + 650*rng.Float64()}})
	}
	// obstacles away from the exit
	for i := 0; i < rng.IntN(6); i++ {
		c := orb.Point{w * rng.Float64(), l * rng.Float64()}
		if math.Hypot(c[0]-exit.X, c[1]-exit.Y) < 1.5 {
			continue
		}
		req.Cell.Obstacles = append(req.Cell.Obstacles, geometry.Obstacle{Name: "o" + string(rune('0'+i)),
			Footprint: geometry.Circle(c, 0.1+0.5*rng.Float64()), ZMin: 0, ZMax: 0.5 + 3*rng.Float64()})
	}
	stand := func() string { return []string{"post", "boom", ""}[rng.IntN(3)] }
	az := func() float64 { return []float64{0, math.Pi / 2, math.Pi}[rng.IntN(3)] }
	req.Arrays = []Array{
		{Name: "A", Kind: Arc, Stand: stand(), Radius: 1 + 8*rng.Float64(), CenterX: rng.Float64(), From: deg(5 + 20*rng.Float64()), To: deg(175), Step: deg(10), Azimuth: az()},
		{Name: "S", Kind: Line, Stand: stand(), Offset: 0.3 + 3*rng.Float64(), XFrom: -1, XTo: 6, Spacing: 0.4, Azimuth: az()},
		{Name: "N", Kind: NearField, Stand: "post", Clearance: 0.05 + 0.5*rng.Float64(), XFrom: 0.05, XTo: 3, Spacing: 0.3, Azimuth: az()},
		{Name: "R", Kind: Ring, Stand: stand(), RingX: 3 * rng.Float64(), Radius: 0.3 + 2*rng.Float64(), AzFrom: 0, AzTo: deg(315), AzStep: deg(45), FullTurn: true},
	}
	return req
}

// hardwarePoints samples a station's microphone, boom, pole and base in the
// cell frame, on their surfaces as well as their axes.
func hardwarePoints(s *Station) []r3.Vec {
	pts := []r3.Vec{s.Mic}
	if s.Stand == nil {
		return pts
	}
	around := func(c r3.Vec, rad float64) {
		for k := 0; k < 8; k++ {
			a := float64(k) * math.Pi / 4
			pts = append(pts, r3.Vec{X: c.X + rad*math.Cos(a), Y: c.Y + rad*math.Sin(a), Z: c.Z})
		}
	}
	top := s.Mic.Z
	for z := 0.0; z <= top; z += 0.01 {
		c := r3.Vec{X: s.Base[0], Y: s.Base[1], Z: z}
		pts = append(pts, c)
		around(c, s.Stand.PoleDiameter/2)
	}
	for z := 0.0; z <= s.Stand.BaseHeight; z += 0.025 {
		around(r3.Vec{X: s.Base[0], Y: s.Base[1], Z: z}, s.Stand.BaseRadius)
	}
	b := r3.Vec{X: s.Base[0], Y: s.Base[1], Z: top}
	for k := 0; k <= 50; k++ {
		c := r3.Add(b, r3.Scale(float64(k)/50, r3.Sub(s.Mic, b)))
		pts = append(pts, c)
		around(c, s.Stand.PoleDiameter/2)
	}
	return pts
}

// TestSafetyInvariant is the planner's safety property: over many random
// cells, jets and arrays, no station reported OK has, for any operating
// point, a mean velocity or temperature above the limits anywhere on its
// microphone, boom, pole or base (sampled with the plume model), nor a
// blocked sight line from the sampled source region (brute force over every
// obstacle and every other stand). The zone part holds for stations that
// only warn as well: zone checks never warn, they block.
func TestSafetyInvariant(t *testing.T) {
	rng := rand.New(rand.NewPCG(7, 11))
	okSeen, usable, bentSeen, attachedSeen := 0, 0, 0, 0
	for n := 0; n < 120; n++ {
		req := randomRequest(rng)
		p, err := New(req)
		if err != nil {
			t.Fatalf("request %d: %v", n, err)
		}
		lim := req.Limits.withDefaults()
		solids := req.Cell.Solids()
		boxes := map[[2]int]bentBox{}
		for k, pt := range p.Points {
			if bp := pt.Plume.Bent(); bp != nil {
				for _, z := range []jet.Zone{jet.VelocityZone, jet.HotZone} {
					boxes[[2]int{k, int(z)}] = newBentBox(bp, z)
				}
			}
		}
		for i := range p.Stations {
			s := &p.Stations[i]
			if s.Status == Blocked {
				continue
			}
			usable++
			// the zones that the floor, ceiling and walls carry on
			for _, a := range p.Attached {
				attachedSeen++
				for _, q := range hardwarePoints(s) {
					if a.Solid.Contains(q) {
						t.Fatalf("request %d, %s usable but at %v inside the %v carried by the %s for %s", n, s.ID, q, a.Zone, a.Surface, a.Point)
					}
				}
			}
			for k, pt := range p.Points {
				// the bent zones of a buoyant point: every sampled point of
				// the hardware outside them
				if bp := pt.Plume.Bent(); bp != nil {
					bentSeen++
					for _, q := range hardwarePoints(s) {
						j := req.Exit.ToJet(q)
						v := q.Z - req.Exit.Exit.Z
						l := math.Sqrt(math.Max(0, j.R*j.R-v*v))
						for _, z := range []jet.Zone{jet.VelocityZone, jet.HotZone} {
							// far outside the path's box, inflated by the
							// largest radius: cannot be inside
							if boxes[[2]int{k, int(z)}].far(j.X, v, l) {
								continue
							}
							if c := bp.Clearance(z, j.X, v, l); c < 0 {
								t.Fatalf("request %d, %s usable but at %v inside the bent %v of %s (%.3g m deep)", n, s.ID, q, z, pt.Name, -c)
							}
						}
					}
				}
				for _, q := range hardwarePoints(s) {
					j := req.Exit.ToJet(q)
					u, t0, ts := pt.Plume.Velocity(j.X, j.R), pt.Plume.TotalTemperature(j.X, j.R), pt.Plume.Temperature(j.X, j.R)
					if u > lim.Velocity || t0 > lim.Temperature || ts > lim.Temperature {
						t.Fatalf("request %d, %s OK but at %v (jet %v) %s gives %.3g m/s, %.1f K total, %.1f K static (limits %.3g m/s, %.1f K)",
							n, s.ID, q, j, pt.Name, u, t0, ts, lim.Velocity, lim.Temperature)
					}
				}
			}
			if s.Status != OK {
				continue
			}
			okSeen++
			// sight lines, brute force
			src := p.Points[0].SourceEnd
			for _, pt := range p.Points {
				src = math.Max(src, pt.SourceEnd)
			}
			for k := 0; k < sightSamples; k++ {
				a := req.Exit.ToCell(geometry.JetPoint{X: src * float64(k) / float64(sightSamples-1)})
				for _, o := range solids {
					if o.SegmentHits(a, s.Mic) {
						t.Fatalf("request %d, %s OK but the line from %v passes through %s", n, s.ID, a, o.Name)
					}
				}
				for j := range p.Stations {
					o := &p.Stations[j]
					if j == i {
						continue
					}
					r := flushRadius
					if o.Stand != nil {
						r = o.Stand.PoleDiameter / 2
					}
					pole := geometry.Solid{Footprint: geometry.Circle(o.Base, r), ZMax: math.Max(o.Mic.Z, flushHeight)}
					if pole.SegmentHits(a, s.Mic) {
						t.Fatalf("request %d, %s OK but the line from %v passes through the stand of %s", n, s.ID, a, o.ID)
					}
				}
			}
		}
	}
	t.Logf("%d usable stations checked, %d of them OK; %d station-point pairs against a bent plume, %d against an attached zone", usable, okSeen, bentSeen, attachedSeen)
	if okSeen < 50 || usable < 1000 {
		t.Errorf("only %d OK and %d usable stations over all requests: the property was barely exercised", okSeen, usable)
	}
}

// bentBox is the bounding box of a bent path inflated by its largest zone
// radius and outline tolerance.
type bentBox struct{ xmin, xmax, vmin, vmax, pad float64 }

func newBentBox(bp *jet.BentPlume, z jet.Zone) bentBox {
	b := bentBox{math.Inf(1), math.Inf(-1), math.Inf(1), math.Inf(-1), 0}
	for _, pt := range bp.Path {
		b.xmin, b.xmax = math.Min(b.xmin, pt.X), math.Max(b.xmax, pt.X)
		b.vmin, b.vmax = math.Min(b.vmin, pt.Z), math.Max(b.vmax, pt.Z)
		b.pad = math.Max(b.pad, pt.Radius(z))
	}
	b.pad += bp.Tolerance
	return b
}

// far reports whether (x, v, l) lies outside the box: it cannot be inside
// the zone.
func (b bentBox) far(x, v, l float64) bool {
	return x < b.xmin-b.pad || x > b.xmax+b.pad || v < b.vmin-b.pad || v > b.vmax+b.pad || l > b.pad
}
