package planner

import (
	"math"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/units"
)

func deg(d float64) float64 { return d * math.Pi / 180 }

// chamber returns a request in an imaginary anechoic chamber: a 12 × 9 m
// room (wedge tips), a 50.8 mm nozzle 3 m from the upstream wall on a rig,
// a collector downstream, three operating points and one array of each kind.
func chamber() *Request {
	box := orb.Ring{{0, 0}, {12, 0}, {12, 9}, {0, 9}, {0, 0}}
	return &Request{
		Source:     "fixture",
		Title:      Title{Title: "fixture", Facility: "Fixture Hall (imaginary)"},
		Units:      units.Metric,
		Convention: FromJetAxis,
		Ambient:    Ambient{Pressure: 101325, Temperature: 288.15, Humidity: 60},
		Cell: geometry.Cell{
			Kind:     geometry.Anechoic,
			Boundary: box,
			Ceiling:  6,
			Floor:    geometry.Treated,
			Obstacles: []geometry.Obstacle{
				{Name: "rig", Footprint: geometry.Polygon(orb.Ring{{1.5, 4.2}, {2.95, 4.2}, {2.95, 4.8}, {1.5, 4.8}, {1.5, 4.2}}), ZMin: 0, ZMax: 1.6},
			},
			KeepOuts:  []geometry.KeepOut{{Name: "door swing", Footprint: geometry.Circle(orb.Point{11, 0.5}, 0.9)}},
			Collector: &geometry.Collector{Inlet: r3.Vec{X: 10.5, Y: 4.5, Z: 1.5}, Diameter: 1.4},
		},
		CutOff: 100,
		Nozzle: jet.Nozzle{Kind: jet.Convergent, Diameter: 0.0508},
		Exit:   geometry.JetFrame{Exit: r3.Vec{X: 3, Y: 4.5, Z: 1.5}},
		Points: []jet.Condition{
			{Name: "cold-0.9", Primary: jet.Stream{NPR: 1.69, TemperatureRatio: 1}},
			{Name: "hot-0.9", Primary: jet.Stream{NPR: 1.86, TotalTemperature: 800}},
			{Name: "cold-1.3", Primary: jet.Stream{NPR: 2.77, TemperatureRatio: 1}},
		},
		Band:   Band{Low: 200, High: 80000},
		Stands: []Stand{{Name: "boom", BaseRadius: 0.3, BaseHeight: 0.1, PoleDiameter: 0.025, BoomLength: 0.3}},
		Arrays: []Array{
			{Name: "A", Kind: Arc, Stand: "boom", AutoRadius: true, From: deg(30), To: deg(150), Step: deg(10)},
			{Name: "S", Kind: Line, Stand: "boom", Offset: 1.8, XFrom: 0, XTo: 3, Spacing: 0.5, Azimuth: math.Pi},
			{Name: "N", Kind: NearField, Stand: "boom", Clearance: 0.3, XFrom: 0.1, XTo: 1.0, Spacing: 0.15, Azimuth: math.Pi},
			{Name: "R", Kind: Ring, Stand: "boom", RingX: 1, Radius: 1.2, AzFrom: 0, AzTo: deg(330), AzStep: deg(30), FullTurn: true},
			{Name: "P", Kind: Probes, Stand: "boom", Fixed: []Fixed{{Name: "rake", At: r3.Vec{X: 4, Y: 4.5, Z: 1.5}}}},
		},
	}
}

// geometryColumn returns a round obstacle of radius r (m) at c occupying
// heights zmin to zmax (m).
func geometryColumn(c orb.Point, r, zmin, zmax float64) geometry.Obstacle {
	return geometry.Obstacle{Name: "column", Footprint: geometry.Circle(c, r), ZMin: zmin, ZMax: zmax}
}
