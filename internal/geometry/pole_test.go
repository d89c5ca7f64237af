package geometry

import (
	"math"
	"math/rand/v2"
	"testing"

	"github.com/paulmach/orb"
)

// poleCell is a 10 m square cell with three obstacles and a keep-out:
//
//	rack   (6,4)–(7,6), z 0–2      on the floor
//	tray   (2,2)–(3,3), z 1–1.8    hung above the floor, higher than a stand base
//	gantry (4,8)–(5,9), z 3–4      overhead
//	door   (0,9)–(1,10)            keep-out
func poleCell() *Cell {
	return &Cell{
		Boundary: box(0, 0, 10, 10),
		Ceiling:  5,
		Obstacles: []Obstacle{
			{Name: "rack", Footprint: Polygon(box(6, 4, 7, 6)), ZMin: 0, ZMax: 2},
			{Name: "tray", Footprint: Polygon(box(2, 2, 3, 3)), ZMin: 1, ZMax: 1.8},
			{Name: "gantry", Footprint: Polygon(box(4, 8, 5, 9)), ZMin: 3, ZMax: 4},
		},
		KeepOuts: []KeepOut{{Name: "door", Footprint: Polygon(box(0, 9, 1, 10))}},
	}
}

func TestPoleClearance(t *testing.T) {
	inf := math.Inf(1)
	// All hand-computed with StandBaseHeight = 0.1 m; pole radius 0.02 m and
	// base radius 0.3 m unless stated.
	tests := []struct {
		name     string
		c        *Cell
		p        orb.Point
		top      float64
		poleR    float64
		baseR    float64
		want     PoleClearance
		wantNote string
	}{
		{"centre: rack base nearest", poleCell(), orb.Point{5, 5}, 1.2, 0.02, 0.3,
			// wall 5 − 0.3; rack d = 1 → base 0.7 (on the floor); tray d = √8 → 3-D base hypot(√8 − 0.3, 0.9);
			// door corner (1,9) at √32, less 0.3
			PoleClearance{Wall: 4.7, Obstacle: 0.7, ObstacleName: "rack", KeepOut: math.Sqrt(32) - 0.3, KeepOutName: "door"}, ""},
		{"beside the hung tray: the pole is nearest", poleCell(), orb.Point{3.5, 2.5}, 1.2, 0.02, 0.3,
			// tray d = 0.5: pole 0.48, base hypot(0.2, 0.9) = 0.922; rack corner (6,4): hypot(2.5, 1.5) − 0.3
			PoleClearance{Wall: 2.2, Obstacle: 0.48, ObstacleName: "tray", KeepOut: math.Hypot(2.5, 6.5) - 0.3, KeepOutName: "door"}, ""},
		{"under the tray edge: the base clears it by height", poleCell(), orb.Point{3.2, 2.5}, 0.8, 0.02, 0.3,
			// top 0.8 < tray ZMin 1: tray left out; rack corner (6,4) hypot(2.8, 1.5) − 0.3
			PoleClearance{Wall: 2.2, Obstacle: math.Hypot(2.8, 1.5) - 0.3, ObstacleName: "rack", KeepOut: math.Hypot(2.2, 6.5) - 0.3, KeepOutName: "door"}, ""},
		{"base reaches under the tray", poleCell(), orb.Point{3.2, 2.5}, 1.5, 0.02, 0.3,
			// tray d = 0.2: pole 0.18, base hypot(max(0.2 − 0.3, 0), 0.9) = 0.9 → 0.18
			PoleClearance{Wall: 2.2, Obstacle: 0.18, ObstacleName: "tray", KeepOut: math.Hypot(2.2, 6.5) - 0.3, KeepOutName: "door"}, ""},
		{"pole inside the rack", poleCell(), orb.Point{6.5, 5}, 1.2, 0.02, 0.3,
			// d = −0.5: pole −0.52, base −0.8
			// wall: nearest is x = 10 at 3.5
			PoleClearance{Wall: 3.2, Obstacle: -0.8, ObstacleName: "rack", KeepOut: math.Hypot(5.5, 4) - 0.3, KeepOutName: "door"}, ""},
		{"tall stand reaches the gantry", poleCell(), orb.Point{4.5, 7}, 3.5, 0.02, 0.3,
			// gantry d = 1: pole 0.98, base hypot(0.7, 2.9); rack corner (6,6): hypot(1.5, 1) − 0.3 = 1.503
			PoleClearance{Wall: 2.7, Obstacle: 0.98, ObstacleName: "gantry", KeepOut: math.Hypot(3.5, 2) - 0.3, KeepOutName: "door"}, ""},
		{"short stand ignores the gantry", poleCell(), orb.Point{4.5, 7}, 2.5, 0.02, 0.3,
			PoleClearance{Wall: 2.7, Obstacle: math.Hypot(1.5, 1) - 0.3, ObstacleName: "rack", KeepOut: math.Hypot(3.5, 2) - 0.3, KeepOutName: "door"}, ""},
		{"in the keep-out", poleCell(), orb.Point{0.5, 9.5}, 1.2, 0.02, 0.3,
			// door d = −0.5 → −0.8; wall 0.5 − 0.3; rack corner (6,6): hypot(5.5, 3.5) − 0.3 = 6.219
			// beats the tray corner (2,3): base hypot(hypot(1.5, 6.5) − 0.3, 0.9) = 6.434
			PoleClearance{Wall: 0.2, Obstacle: math.Hypot(5.5, 3.5) - 0.3, ObstacleName: "rack", KeepOut: -0.8, KeepOutName: "door"}, ""},
		{"outside the wall", poleCell(), orb.Point{10.1, 5}, 1.2, 0.02, 0.3,
			PoleClearance{Wall: -0.4, Obstacle: 3.1 - 0.3, ObstacleName: "rack", KeepOut: math.Hypot(9.1, 4) - 0.3, KeepOutName: "door"}, ""},
		{"base on the wall", poleCell(), orb.Point{0.3, 5}, 1.2, 0.02, 0.3,
			// tray corner (2,3): pole hypot(1.7, 2) − 0.02 = 2.605, base hypot(hypot(1.7, 2) − 0.3, 0.9) = 2.493
			PoleClearance{Wall: 0, Obstacle: math.Hypot(math.Hypot(1.7, 2)-0.3, 0.9), ObstacleName: "tray", KeepOut: 4 - 0.3, KeepOutName: "door"}, ""},
		{"no base: pole only", poleCell(), orb.Point{5, 5}, 1.2, 0.05, 0,
			PoleClearance{Wall: 4.95, Obstacle: 0.95, ObstacleName: "rack", KeepOut: math.Sqrt(32) - 0.05, KeepOutName: "door"}, ""},
		{"unbounded, nothing in it", &Cell{}, orb.Point{5, 5}, 1.2, 0.02, 0.3,
			PoleClearance{Wall: inf, Obstacle: inf, KeepOut: inf}, ""},
		{"NaN point", poleCell(), orb.Point{math.NaN(), 5}, 1.2, 0.02, 0.3,
			PoleClearance{Wall: math.NaN(), Obstacle: math.NaN(), KeepOut: math.NaN()}, ""},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			got := tt.c.PoleClearance(tt.p, tt.top, tt.poleR, tt.baseR)
			if !near(got.Wall, tt.want.Wall, 1e-12) {
				t.Errorf("Wall: got %.15g, want %.15g", got.Wall, tt.want.Wall)
			}
			if !near(got.Obstacle, tt.want.Obstacle, 1e-12) || got.ObstacleName != tt.want.ObstacleName {
				t.Errorf("Obstacle: got %.15g %q, want %.15g %q", got.Obstacle, got.ObstacleName, tt.want.Obstacle, tt.want.ObstacleName)
			}
			if !near(got.KeepOut, tt.want.KeepOut, 1e-12) || got.KeepOutName != tt.want.KeepOutName {
				t.Errorf("KeepOut: got %.15g %q, want %.15g %q", got.KeepOut, got.KeepOutName, tt.want.KeepOut, tt.want.KeepOutName)
			}
		})
	}
	mustPanic(t, "negative pole radius", func() { poleCell().PoleClearance(orb.Point{5, 5}, 1, -0.01, 0.3) })
	mustPanic(t, "NaN top", func() { poleCell().PoleClearance(orb.Point{5, 5}, math.NaN(), 0.01, 0.3) })
}

// manyObstacles returns a 30 m × 20 m cell with n obstacles scattered on
// the floor at assorted heights.
func manyObstacles(n int) *Cell {
	rng := rand.New(rand.NewPCG(51, 52))
	c := &Cell{Boundary: box(0, 0, 30, 20), Ceiling: 8}
	for i, s := range randomSolids(rng, n, 30, 20) {
		zmax := math.Min(s.ZMax, 8)
		c.Obstacles = append(c.Obstacles, Obstacle{Name: "o" + string(rune('A'+i%26)), Footprint: s.Footprint, ZMin: s.ZMin, ZMax: zmax})
	}
	return c
}

func TestPropertyPoleClearancePruning(t *testing.T) {
	// The bounding-box pruning must not change the answer: compare with the
	// definition evaluated over every obstacle.
	c := manyObstacles(200)
	rng := rand.New(rand.NewPCG(53, 54))
	for range 500 {
		p := orb.Point{30 * rng.Float64(), 20 * rng.Float64()}
		top, poleR, baseR := 0.5+2*rng.Float64(), 0.03*rng.Float64(), 0.4*rng.Float64()
		want := math.Inf(1)
		for _, o := range c.Obstacles {
			if o.ZMax < 0 || o.ZMin > top {
				continue
			}
			d := o.Footprint.Distance(p)
			base := d - baseR
			if o.ZMin > StandBaseHeight {
				base = math.Hypot(math.Max(base, 0), o.ZMin-StandBaseHeight)
			}
			want = math.Min(want, math.Min(d-poleR, base))
		}
		if got := c.PoleClearance(p, top, poleR, baseR).Obstacle; got != want {
			t.Fatalf("point %v top %g poleR %g baseR %g: got %.17g, want %.17g", p, top, poleR, baseR, got, want)
		}
	}
}

func BenchmarkPoleClearance(b *testing.B) {
	c := manyObstacles(200)
	rng := rand.New(rand.NewPCG(55, 56))
	const nq = 1024
	pts := make([]orb.Point, nq)
	for i := range pts {
		pts[i] = orb.Point{30 * rng.Float64(), 20 * rng.Float64()}
	}
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; b.Loop(); i++ {
		c.PoleClearance(pts[i%nq], 1.5, 0.02, 0.3)
	}
}
