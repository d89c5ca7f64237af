package sheet_test

import (
	"fmt"
	"io"
	"math"
	"testing"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/planner"
	"arcwright/internal/sheet"
	"arcwright/internal/units"
)

// crowdPlan plans n microphones on posts (base radius 0.2 m) on a square
// grid span metres across beside the jet in a 20 m room: with span below
// 0.28 m every stand overlaps every other (the planner's crowd benchmark
// makes its crowds the same way), and a span of a millimetre piles the
// marks on one spot of the plan.
func crowdPlan(t testing.TB, n int, span float64) *planner.Plan {
	t.Helper()
	side := int(math.Ceil(math.Sqrt(float64(n))))
	step := span / float64(max(side-1, 1))
	fixed := make([]planner.Fixed, n)
	for i := range fixed {
		fixed[i] = planner.Fixed{Name: fmt.Sprintf("A-%05d", i+1),
			At: r3.Vec{X: 6 + step*float64(i%side), Y: 8 + step*float64(i/side), Z: 1.5}}
	}
	req := &planner.Request{
		Source: "crowd", Units: units.Metric, Convention: planner.FromJetAxis,
		Title:   planner.Title{Title: "Crowded stands", Facility: "Test hall"},
		Ambient: planner.Ambient{Pressure: 101325, Temperature: 293.15, Humidity: 70},
		Cell: geometry.Cell{
			Kind: geometry.HardWalled, Boundary: orb.Ring{{0, 0}, {20, 0}, {20, 20}, {0, 20}, {0, 0}},
			Ceiling: 5, Floor: geometry.Treated,
		},
		Nozzle: jet.Nozzle{Kind: jet.Convergent, Diameter: 0.025},
		Exit:   geometry.JetFrame{Exit: r3.Vec{X: 10, Y: 10, Z: 1.5}},
		Points: []jet.Condition{{Name: "cold", Primary: jet.Stream{NPR: 1.3, TemperatureRatio: 1}}},
		Limits: planner.DefaultLimits(),
		Band:   planner.Band{Low: 500, High: 20000},
		Stands: []planner.Stand{{Name: "post", BaseRadius: 0.2, BaseHeight: 0.1, PoleDiameter: 0.02}},
		Arrays: []planner.Array{{Name: "A", Kind: planner.Points, Stand: "post", Fixed: fixed}},
	}
	p, err := planner.New(req)
	if err != nil {
		t.Fatalf("crowd of %d: %v", n, err)
	}
	return p
}

// BenchmarkSheetScale builds and renders the sheet of 1,000 to 20,000
// stations: spread out on the pad's four arcs and two sidelines, crowded
// (every stand overlapping every other, 0.28 m across) and piled (within
// 1 mm). Its ns/station metric stays flat when the cost grows linearly in
// the number of stations (issue 10 item 12: the label placer made a crowd
// of 20,000 take over a minute).
func BenchmarkSheetScale(b *testing.B) {
	for _, shape := range []struct {
		name string
		plan func(testing.TB, int) *planner.Plan
	}{
		{"spread", padPlan},
		{"crowd", func(t testing.TB, n int) *planner.Plan { return crowdPlan(t, n, 0.28) }},
		{"piled", func(t testing.TB, n int) *planner.Plan { return crowdPlan(t, n, 0.001) }},
	} {
		for _, n := range []int{1000, 2000, 5000, 10000, 20000} {
			b.Run(fmt.Sprintf("%s/stations=%d", shape.name, n), func(b *testing.B) {
				p := shape.plan(b, n)
				b.ReportAllocs()
				b.ResetTimer()
				for b.Loop() {
					if err := sheet.Write(io.Discard, p, sheet.Options{}); err != nil {
						b.Fatal(err)
					}
				}
				b.ReportMetric(float64(b.Elapsed().Nanoseconds())/float64(b.N)/float64(len(p.Stations)), "ns/station")
			})
		}
	}
}
