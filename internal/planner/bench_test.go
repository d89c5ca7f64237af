package planner

import (
	"fmt"
	"math"
	"math/rand/v2"
	"slices"
	"testing"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
)

// bigRequest returns a 60 × 40 m hall with obstacles columns scattered
// around, points operating points and stations microphones on posts in a
// grid to the side of the jet (fixed seed).
func bigRequest(stations, obstacles, points int) *Request {
	rng := rand.New(rand.NewPCG(42, 7))
	req := room(10)
	req.Cell.Boundary = orb.Ring{{0, 0}, {60, 0}, {60, 40}, {0, 40}, {0, 0}}
	req.Cell.Ceiling = 12
	req.Exit.Exit = r3.Vec{X: 10, Y: 20, Z: 1.5}
	req.Nozzle.Diameter = 0.05
	req.Points = nil
	for i := 0; i < points; i++ {
		f := float64(i) / float64(max(points-1, 1))
		req.Points = append(req.Points, jet.Condition{Name: fmt.Sprintf("op%02d", i),
			Primary: jet.Stream{NPR: 1.1 + 1.9*f, TotalTemperature: 288 + 600*math.Mod(7*f, 1)}})
	}
	for i := 0; i < obstacles; i++ {
		c := orb.Point{60 * rng.Float64(), 40 * rng.Float64()}
		if math.Abs(c[1]-20) < 6 {
			c[1] += 12 * math.Copysign(1, c[1]-20)
		}
		req.Cell.Obstacles = append(req.Cell.Obstacles, geometry.Obstacle{Name: fmt.Sprintf("col%03d", i),
			Footprint: geometry.Circle(c, 0.15), ZMax: 3})
	}
	fixed := make([]Fixed, stations)
	for i := range fixed {
		// rows of 50 at 0.6 m, on both sides, clear of the plume
		row, col := i/50, i%50
		y := 25 + 0.6*float64(row%20)
		if row >= 20 {
			y = 15 - 0.6*float64(row%20)
		}
		fixed[i] = Fixed{Name: fmt.Sprintf("m%04d", i), At: r3.Vec{X: 2 + 0.6*float64(col)*1.8, Y: y, Z: 1.5}}
	}
	req.Arrays = []Array{{Name: "G", Kind: Points, Stand: "post", Fixed: fixed}}
	req.Stands[0].BaseRadius = 0.12
	return req
}

// BenchmarkPlan plans 2,000 stations in a room with 200 obstacles for 50
// operating points (target: under 1 s on a 2-core machine), and smaller
// problems to show the growth. The ns/unit metric is the time per station
// per (obstacle + operating point): it stays flat when the cost grows
// linearly in stations × (obstacles + points).
func BenchmarkPlan(b *testing.B) {
	for _, sz := range []struct{ st, ob, pt int }{
		{500, 200, 50}, {1000, 200, 50}, {2000, 200, 50}, {2000, 50, 50}, {2000, 200, 12},
	} {
		b.Run(fmt.Sprintf("stations=%d/obstacles=%d/points=%d", sz.st, sz.ob, sz.pt), func(b *testing.B) {
			req := bigRequest(sz.st, sz.ob, sz.pt)
			b.ReportAllocs()
			for b.Loop() {
				p, err := New(req)
				if err != nil {
					b.Fatal(err)
				}
				if len(p.Stations) != sz.st {
					b.Fatalf("got %d stations", len(p.Stations))
				}
			}
			b.ReportMetric(float64(b.Elapsed().Nanoseconds())/float64(b.N)/float64(sz.st*(sz.ob+sz.pt)), "ns/unit")
		})
	}
}

// scaleRequest returns a hall w × 40 m with stations microphones on posts
// in rows of 100 at 0.6 m beside the jet, 20 columns and 4 operating points
// (fixed seed), its outline drawn with about vertices vertices (each wall
// subdivided, every vertex moved up to 2 mm in or out as a survey would).
func scaleRequest(stations, vertices int) *Request {
	rows := (stations + 99) / 100
	w := math.Max(80, 0.6*float64(rows/2)+20)
	req := bigRequest(0, 20, 4)
	req.Cell.Boundary = surveyedBox(w, 40, vertices)
	fixed := make([]Fixed, stations)
	for i := range fixed {
		row, col := i/100, i%100
		y := 24 + 0.3*float64(col%50)
		if col >= 50 {
			y = 16 - 0.3*float64(col%50)
		}
		fixed[i] = Fixed{Name: fmt.Sprintf("m%05d", i), At: r3.Vec{X: 2 + 0.6*float64(row), Y: y, Z: 1.5}}
	}
	req.Arrays = []Array{{Name: "G", Kind: Points, Stand: "post", Fixed: fixed}}
	req.Stands[0].BaseRadius = 0.1
	return req
}

// surveyedBox returns the closed outline of the rectangle (0,0)–(w,h) with
// about n vertices spread along its walls, each moved up to 2 mm across
// the wall (fixed seed).
func surveyedBox(w, h float64, n int) orb.Ring {
	rng := rand.New(rand.NewPCG(9, 10))
	per := 2 * (w + h) / float64(max(n, 4))
	var r orb.Ring
	side := func(a, b orb.Point) {
		l := math.Hypot(b[0]-a[0], b[1]-a[1])
		k := max(1, int(l/per))
		nx, ny := -(b[1]-a[1])/l, (b[0]-a[0])/l
		for i := range k {
			f := float64(i) / float64(k)
			d := 0.0
			if i > 0 {
				d = 0.002 * (2*rng.Float64() - 1)
			}
			r = append(r, orb.Point{a[0] + f*(b[0]-a[0]) + d*nx, a[1] + f*(b[1]-a[1]) + d*ny})
		}
	}
	side(orb.Point{0, 0}, orb.Point{w, 0})
	side(orb.Point{w, 0}, orb.Point{w, h})
	side(orb.Point{w, h}, orb.Point{0, h})
	side(orb.Point{0, h}, orb.Point{0, 0})
	return append(r, r[0])
}

// BenchmarkPlanScale plans up to 20,000 stations and outlines of up to
// 50,000 vertices. Its metrics stay flat when the cost grows linearly:
// ns/station with the number of stations (outline of 4 vertices), and
// ns/vertex with the number of vertices (200 stations), less the fixed cost
// of the 200 stations. Before the boundary was indexed a 50,000-vertex
// outline took minutes.
func BenchmarkPlanScale(b *testing.B) {
	for _, sz := range []struct{ st, vx int }{
		{2500, 4}, {5000, 4}, {10000, 4}, {20000, 4},
		{200, 5000}, {200, 20000}, {200, 50000},
	} {
		b.Run(fmt.Sprintf("stations=%d/vertices=%d", sz.st, sz.vx), func(b *testing.B) {
			req := scaleRequest(sz.st, sz.vx)
			if err := geometry.CheckRing(req.Cell.Boundary); err != nil {
				b.Fatal(err)
			}
			b.ReportAllocs()
			for b.Loop() {
				// a fresh cell each time, so that the boundary is indexed
				// (and checked, as validate does) inside the loop
				r := *req
				r.Cell.Boundary = slices.Clone(req.Cell.Boundary)
				if err := geometry.CheckRing(r.Cell.Boundary); err != nil {
					b.Fatal(err)
				}
				p, err := New(&r)
				if err != nil {
					b.Fatal(err)
				}
				if len(p.Stations) != sz.st {
					b.Fatalf("got %d stations", len(p.Stations))
				}
			}
			per := float64(b.Elapsed().Nanoseconds()) / float64(b.N)
			if sz.vx > 4 {
				b.ReportMetric(per/float64(sz.vx), "ns/vertex")
			} else {
				b.ReportMetric(per/float64(sz.st), "ns/station")
			}
		})
	}
}
