package planner

import (
	"fmt"
	"math"
	"math/rand/v2"
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
