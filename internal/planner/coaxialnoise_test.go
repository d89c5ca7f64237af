package planner

import (
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/acoustics"
	"arcwright/internal/geometry"
	"arcwright/internal/jet"
)

// TestCoaxialStationLevels checks that a plan's level for a coaxial point
// is not the fully mixed jet's alone, which is a lower bound for
// separate-flow jets (common practice), but at least the louder stream's
// single-stream ARP 876 prediction at the same path, with a wider stated
// uncertainty than a single stream's ±3 dB.
func TestCoaxialStationLevels(t *testing.T) {
	req := point(r3.Vec{})
	req.Nozzle = jet.Nozzle{Kind: jet.Coaxial, Diameter: 0.025, SecondaryDiameter: 0.05}
	req.Points = []jet.Condition{{Name: "hot core", Primary: jet.Stream{NPR: 1.8, TemperatureRatio: 2.5}, Secondary: &jet.Stream{NPR: 1.5, TemperatureRatio: 1}}}
	req.Cell.Kind = geometry.Anechoic
	req.CutOff = 100
	probe := mustPlan(t, req)
	lc := probe.Points[0].CoreNominal
	for _, polar := range []float64{20, 40, 90, 150} {
		th := polar * math.Pi / 180
		req.Arrays[0].Fixed[0].At = r3.Add(req.Exit.Exit, r3.Vec{X: lc + 3*math.Cos(th), Y: 3 * math.Sin(th)})
		p := mustPlan(t, req)
		if !strings.Contains(strings.Join(p.Warnings, "\n"), "hot core: coaxial jet: the levels are, band by band, the larger of the fully mixed jet") {
			t.Errorf("the plan's warnings do not say how the coaxial point is predicted: %q", p.Warnings)
		}
		got := p.Stations[0].Levels[0]
		atm := acoustics.Atmosphere{Temperature: req.Ambient.Temperature, RelativeHumidity: req.Ambient.Humidity, Pressure: req.Ambient.Pressure}
		prim, sec, err := jet.StreamExits(req.Nozzle, p.Points[0].Condition)
		if err != nil {
			t.Fatal(err)
		}
		for _, e := range []jet.Exit{prim, sec} {
			j := NoiseJet(e)
			src, err := acoustics.NewNoiseSource(j, atm, acoustics.NoiseBands(j))
			if err != nil {
				t.Fatal(err)
			}
			want, err := src.At(acoustics.Path{Distance: 3, Polar: th}, nil)
			if err != nil {
				t.Fatal(err)
			}
			if got.OASPL < want.OASPL-1e-6 {
				t.Errorf("%g°: got %.2f dB, below the %.2f dB of a stream alone", polar, got.OASPL, want.OASPL)
			}
			if !(got.Uncertainty > want.Uncertainty) {
				t.Errorf("%g°: got ±%g dB, want wider than a single stream's ±%g dB", polar, got.Uncertainty, want.Uncertainty)
			}
		}
	}
}
