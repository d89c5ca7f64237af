package jet

import (
	"math"
	"testing"
)

// FuzzPlume checks that for any finite input the model either refuses it
// with an error or returns finite numbers everywhere: never a panic, NaN or
// infinity where a length or a speed is expected.
func FuzzPlume(f *testing.F) {
	f.Add(uint8(0), 0.05, 0.0, 0.0, 1.5, 288.15, 1.4, 287.05, 1.3, 300.0, 101325.0, 288.15, 5.0, 323.15)
	f.Add(uint8(1), 0.05, 1.5, 0.0, 3.671, 800.0, 1.33, 290.0, 1.3, 300.0, 101325.0, 300.0, 1.0, 400.0)
	f.Add(uint8(2), 0.3, 0.0, 20.0, 2.5, 600.0, 1.4, 287.05, 1.3, 300.0, 90000.0, 270.0, 10.0, 350.0)
	f.Add(uint8(3), 0.1, 0.0, 0.0, 1.6, 700.0, 1.35, 288.0, 1.4, 310.0, 101325.0, 288.15, 5.0, 323.15)
	f.Add(uint8(0), 0.001, 0.0, 0.0, 1.0001, 290.0, 1.4, 287.05, 1.0, 300.0, 101325.0, 288.15, 0.1, 289.0)
	f.Add(uint8(0), 5.0, 0.0, 0.0, 60.0, 2500.0, 1.2, 300.0, 1.0, 300.0, 101325.0, 320.0, 50.0, 330.0)
	// the two seeds with which this target found zones that vanished on
	// overflow ("Dj = +Inf" at NPR 1e305, "Mj = NaN" at T0 = 1e300 K):
	// both must now be refused
	f.Add(uint8(0), 0.05, 0.0, 0.0, 1e305, 288.15, 1.4, 287.05, 1.3, 300.0, 101325.0, 288.15, 5.0, 323.15)
	f.Add(uint8(0), 0.05, 0.0, 0.0, 1.5, 1e300, 1.4, 287.05, 1.3, 300.0, 101325.0, 288.15, 5.0, 323.15)
	f.Fuzz(func(t *testing.T, kind uint8, d, md, ar, npr, t0, gamma, r, npr2, t02, pa, ta, ulim, tlim float64) {
		n := Nozzle{Kind: Kind(kind%4 + 1), Diameter: d, DesignMach: md}
		c := Condition{Primary: Stream{NPR: npr, TotalTemperature: t0, Gas: Gas{Gamma: gamma, R: r}}, Ambient: Ambient{Pressure: pa, Temperature: ta}}
		switch n.Kind {
		case Rectangular:
			n = RectangularFromAspect(d, math.Max(1, math.Abs(ar)), md)
		case Coaxial:
			n.SecondaryDiameter = d * (1 + math.Abs(ar))
			c.Secondary = &Stream{NPR: npr2, TotalTemperature: t02}
		}
		p, err := NewPlume(n, c, Limits{Velocity: ulim, Temperature: tlim})
		if err != nil {
			return
		}
		e := p.Exit()
		for name, v := range map[string]float64{"Mj": e.Mach, "Uj": e.Velocity, "Tj": e.StaticTemperature, "ρj": e.Density, "Dj": e.FullyExpandedDiameter, "Deff": e.EffectiveDiameter, "Re": e.Reynolds, "Re∞": e.AmbientReynolds, "Mc": e.ConvectiveMach} {
			if math.IsNaN(v) || math.IsInf(v, 0) || v < 0 {
				t.Fatalf("exit %s = %v", name, v)
			}
		}
		for _, z := range []Zone{VelocityZone, HotZone} {
			for _, v := range []Variant{Nominal, Conservative} {
				en := p.Envelope(z, v)
				for _, x := range []float64{en.Length, en.MaxRadius, en.MaxRadiusAt, en.Tolerance} {
					if math.IsNaN(x) || math.IsInf(x, 0) || x < 0 {
						t.Fatalf("%v %v envelope: %+v", z, v, en)
					}
				}
				for _, pt := range en.Points {
					if math.IsNaN(pt[0]) || math.IsNaN(pt[1]) || math.IsInf(pt[0], 0) || math.IsInf(pt[1], 0) {
						t.Fatalf("%v %v envelope point %v", z, v, pt)
					}
				}
				if c := en.Clearance(e.FullyExpandedDiameter, 10*e.FullyExpandedDiameter); math.IsNaN(c) {
					t.Fatalf("NaN clearance")
				}
			}
		}
		dj := e.FullyExpandedDiameter
		for _, x := range []float64{0, 0.5 * dj, 5 * dj, 50 * dj} {
			for _, rr := range []float64{0, 0.4 * dj, 2 * dj} {
				for _, v := range []float64{p.Velocity(x, rr), p.Temperature(x, rr), p.TotalTemperature(x, rr), p.HalfVelocityRadius(x)} {
					if math.IsNaN(v) || math.IsInf(v, 0) {
						t.Fatalf("field at (%g, %g) = %v", x, rr, v)
					}
				}
			}
		}
	})
}
