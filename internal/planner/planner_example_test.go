package planner_test

import (
	"fmt"
	"math"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/planner"
	"arcwright/internal/units"
)

// Plan a polar arc around a model jet in an imaginary 16 × 12 m anechoic
// chamber and read the verdicts.
func ExampleNew() {
	deg := math.Pi / 180
	req := &planner.Request{
		Units:      units.Metric,
		Convention: planner.FromJetAxis,
		Ambient:    planner.Ambient{Pressure: 101325, Temperature: 293.15, Humidity: 50},
		Cell: geometry.Cell{
			Kind:     geometry.Anechoic,
			Boundary: orb.Ring{{0, 0}, {16, 0}, {16, 12}, {0, 12}, {0, 0}},
			Ceiling:  7,
			Floor:    geometry.Treated,
		},
		Nozzle: jet.Nozzle{Kind: jet.Convergent, Diameter: 0.0508},
		Exit:   geometry.JetFrame{Exit: r3.Vec{X: 6, Y: 6, Z: 1.6}},
		Points: []jet.Condition{{Name: "SP03", Primary: jet.Stream{NPR: 1.86, TemperatureRatio: 1}}},
		Band:   planner.Band{Low: 200, High: 40000},
		Stands: []planner.Stand{{Name: "post", BaseRadius: 0.15, BaseHeight: 0.1, PoleDiameter: 0.02}},
		Arrays: []planner.Array{{Name: "A", Kind: planner.Arc, Stand: "post", AutoRadius: true,
			From: 20 * deg, To: 140 * deg, Step: 20 * deg}},
	}
	p, err := planner.New(req)
	if err != nil {
		fmt.Println(err)
		return
	}
	a := p.Arrays[0]
	fmt.Printf("arc %s: radius %.3f m (largest the room allows), first clear angle %.1f° %s\n",
		a.Name, a.Radius, a.MinClearPolar/deg, req.Convention)
	for _, s := range p.Stations {
		fmt.Printf("%s ch%d %5.1f° %s\n", s.ID, s.Channel, s.Polar/deg, s.Status)
	}
	// Output:
	// arc A: radius 5.504 m (largest the room allows), first clear angle 12.3° from the downstream jet axis
	// A-01 ch1  20.0° ok
	// A-02 ch2  40.0° ok
	// A-03 ch3  60.0° ok
	// A-04 ch4  80.0° ok
	// A-05 ch5 100.0° ok
	// A-06 ch6 120.0° ok
	// A-07 ch7 140.0° ok
}
