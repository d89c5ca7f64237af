package planner_test

import (
	"fmt"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/acoustics"
	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/planner"
	"arcwright/internal/units"
)

// Predict the levels at two microphones and at a crew position around a
// model jet in an imaginary 16 × 12 m anechoic chamber, and the noise
// contours of the sheet.
func ExamplePlan_NoiseMap() {
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
		Stands: []planner.Stand{{Name: "post", BaseRadius: 0.15, BaseHeight: 0.1, PoleDiameter: 0.02,
			Microphone: &acoustics.Microphone{Name: "1/4 in", MaxLevel: 160, UpperFrequency: 70e3}}},
		Arrays: []planner.Array{{Name: "M", Kind: planner.Points, Stand: "post", Fixed: []planner.Fixed{
			{Name: "side", At: r3.Vec{X: 6.5, Y: 10, Z: 1.6}},
			{Name: "aft", At: r3.Vec{X: 10, Y: 9, Z: 1.6}},
		}}},
		Crew: []planner.Crew{{Name: "door", At: r3.Vec{X: 1, Y: 1, Z: 1.6}, Hours: 1}},
	}
	p, err := planner.New(req)
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, s := range p.Stations {
		l := s.Levels[0]
		fmt.Printf("%s: %.0f dB OASPL, %.0f dB(A), peak %.0f dB(C)\n", s.ID, l.OASPL, l.AWeighted, l.Peak)
	}
	for _, e := range p.Crew {
		fmt.Printf("crew %s: %.0f dB(A), NIOSH allows %.2g h, %s\n", e.Name, e.AWeighted, e.AllowedHours, e.Status)
	}
	m, err := p.NoiseMap()
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, c := range m.Contours {
		fmt.Printf("%s: %d lines, everywhere %v\n", c.Label(), len(c.Lines), c.Everywhere)
	}
	// The door warns: 88 dB(A) for 1 h is an L_EX,8h of 79 dB(A), and the
	// estimate's stated uncertainty reaches the 80 dB(A) action value.
	//
	// Output:
	// side: 97 dB OASPL, 96 dB(A), peak 107 dB(C)
	// aft: 105 dB OASPL, 105 dB(A), peak 117 dB(C)
	// crew door: 88 dB(A), NIOSH allows 4.2 h, warn
	// 85 dB(A): 0 lines, everywhere true
	// 140 dB(C) peak: 1 lines, everywhere false
}
