package jet_test

import (
	"fmt"

	"arcwright/internal/jet"
)

// A cold 2-inch model jet at NPR 2.5 is choked and under-expanded.
func ExampleExitState() {
	n := jet.Nozzle{Kind: jet.Convergent, Diameter: 0.0508}
	c := jet.Condition{
		Primary: jet.Stream{NPR: 2.5, TemperatureRatio: 1},
		Ambient: jet.StandardAmbient(),
	}
	e, err := jet.ExitState(n, c)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("Mj %.3f, Uj %.1f m/s, Dj %.1f mm, %v\n", e.Mach, e.Velocity, 1000*e.FullyExpandedDiameter, e.Expansion)
	fmt.Printf("shock cells %.1f mm apart\n", 1000*e.ShockCellSpacing)
	// Output:
	// Mj 1.223, Uj 365.2 m/s, Dj 51.7 mm, under-expanded
	// shock cells 40.1 mm apart
}

// The zones of a hot subsonic jet: the conservative envelope, which
// clearances use, is larger than the nominal one.
func ExampleNewPlume() {
	n := jet.Nozzle{Kind: jet.Convergent, Diameter: 0.0508}
	c := jet.Condition{Primary: jet.Stream{NPR: 1.8, TotalTemperature: 800}, Ambient: jet.StandardAmbient()}
	p, err := jet.NewPlume(n, c, jet.DefaultLimits())
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("core %.3f m\n", p.CoreLength(jet.Nominal))
	for _, z := range []jet.Zone{jet.VelocityZone, jet.HotZone} {
		for _, v := range []jet.Variant{jet.Nominal, jet.Conservative} {
			e := p.Envelope(z, v)
			fmt.Printf("%v, %v: %.2f m long, %.2f m wide at most\n", z, v, e.Length, e.MaxRadius)
		}
	}
	fmt.Printf("clearance of a microphone 1 m off the axis at x = 0.5 m: %.2f m\n",
		p.Envelope(jet.VelocityZone, jet.Conservative).Clearance(0.5, 1))
	// Output:
	// core 0.211 m
	// velocity zone, nominal: 19.38 m long, 0.93 m wide at most
	// velocity zone, conservative: 20.70 m long, 1.23 m wide at most
	// hot zone, nominal: 2.63 m long, 0.14 m wide at most
	// hot zone, conservative: 2.82 m long, 0.23 m wide at most
	// clearance of a microphone 1 m off the axis at x = 0.5 m: 0.82 m
}
