package geometry_test

import (
	"fmt"
	"math"

	"arcwright/internal/geometry"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"
)

// An L-shaped anechoic chamber, wedge-tip plane in plan (metres):
//
//	(0,8) +-----+ (4,8)
//	      |     |
//	      |     +---------+ (10,4)
//	      |   (4,4)       |
//	(0,0) +---------------+ (10,0)
func lChamber() *geometry.Cell {
	return &geometry.Cell{
		Kind:     geometry.Anechoic,
		Boundary: orb.Ring{{0, 0}, {10, 0}, {10, 4}, {4, 4}, {4, 8}, {0, 8}, {0, 0}},
		Ceiling:  5,
	}
}

func ExampleCell_Contains() {
	c := lChamber()
	if err := c.Validate(); err != nil {
		fmt.Println(err)
		return
	}
	for _, p := range []orb.Point{{2, 2}, {7, 3}, {4, 6}, {7, 6}} {
		fmt.Printf("%v inside %-5v wall distance %+.2f m\n", p, c.Contains(p), c.WallDistance(p))
	}
	// Output:
	// [2 2] inside true  wall distance +2.00 m
	// [7 3] inside true  wall distance +1.00 m
	// [4 6] inside true  wall distance +0.00 m
	// [7 6] inside false wall distance -2.00 m
}

func ExampleCell_FreeRay() {
	c := lChamber()
	from := orb.Point{2, 2}
	for _, deg := range []float64{0, 45, 90, 180} {
		d := c.FreeRay(from, deg*math.Pi/180)
		fmt.Printf("heading %3.0f°: %.3f m\n", deg, d)
	}
	// Output:
	// heading   0°: 8.000 m
	// heading  45°: 2.828 m
	// heading  90°: 6.000 m
	// heading 180°: 2.000 m
}

func ExampleJetFrame() {
	// A nozzle 1.5 m above the floor at (2, 4) m, exhausting along −Y.
	f := geometry.JetFrame{Exit: r3.Vec{X: 2, Y: 4, Z: 1.5}, Heading: -math.Pi / 2}
	mic := r3.Vec{X: 5, Y: 0, Z: 1.5} // 4 m downstream, 3 m to the jet's left
	q := f.ToJet(mic)
	fmt.Printf("X %.2f m, R %.2f m, azimuth %.0f°\n", q.X, q.R, q.Azimuth*180/math.Pi)
	fmt.Printf("polar angle %.2f° from the downstream axis, %.2f m from the exit\n", q.Polar()*180/math.Pi, q.Distance())
	back := f.ToCell(geometry.JetPoint{X: 4, R: 3, Azimuth: math.Pi / 2}) // same distances, straight up
	fmt.Printf("cell position (%.2f, %.2f, %.2f) m\n", back.X, back.Y, back.Z)
	// Output:
	// X 4.00 m, R 3.00 m, azimuth 0°
	// polar angle 36.87° from the downstream axis, 5.00 m from the exit
	// cell position (2.00, 0.00, 4.50) m
}

func ExampleCheckRing() {
	bowTie := orb.Ring{{0, 0}, {4, 4}, {4, 0}, {0, 4}, {0, 0}}
	fmt.Println(geometry.CheckRing(bowTie))
	open := orb.Ring{{0, 0}, {4, 0}, {4, 4}}
	fmt.Println(geometry.CheckRing(open))
	// Output:
	// geometry: self-intersecting: edge 1-2 from (0, 0) to (4, 4) meets edge 3-4 from (4, 0) to (0, 4)
	// geometry: not closed: last vertex (4, 4) differs from first (0, 0); repeat the first vertex at the end
}

func ExampleIndex_AppendSegmentHits() {
	solids := []geometry.Solid{
		{Name: "rig", Footprint: geometry.Polygon(orb.Ring{{3, -1}, {4, -1}, {4, 1}, {3, 1}, {3, -1}}), ZMin: 0, ZMax: 1.2},
		{Name: "camera pole", Footprint: geometry.Circle(orb.Point{6, 0.5}, 0.025), ZMin: 0, ZMax: 2.5},
		{Name: "cable tray", Footprint: geometry.Polygon(orb.Ring{{1, -3}, {2, -3}, {2, 3}, {1, 3}, {1, -3}}), ZMin: 3, ZMax: 3.2},
	}
	ix := geometry.NewIndex(solids)
	nozzle := r3.Vec{X: 0, Y: 0, Z: 1.5}
	var hits []int
	for _, mic := range []r3.Vec{{X: 8, Y: 0, Z: 1.5}, {X: 12, Y: 1, Z: 1.5}, {X: 8, Y: 0, Z: 0.5}} {
		hits = ix.AppendSegmentHits(hits[:0], nozzle, mic)
		fmt.Printf("to (%g, %g, %g):", mic.X, mic.Y, mic.Z)
		for _, i := range hits {
			fmt.Printf(" %s;", ix.Solid(i).Name)
		}
		fmt.Println()
	}
	// Output:
	// to (8, 0, 1.5):
	// to (12, 1, 1.5): camera pole;
	// to (8, 0, 0.5): rig;
}
