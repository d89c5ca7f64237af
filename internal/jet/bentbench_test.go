package jet

import "testing"

// BenchmarkNewPlumeBent measures one operating point of a hot, slow
// exhaust whose zones bend (the bent-plume integration included).
func BenchmarkNewPlumeBent(b *testing.B) {
	a := StandardAmbient()
	g := Air()
	m := 20 / g.SoundSpeed(400-20*20/(2*g.Cp()))
	c := Condition{Primary: Stream{NPR: g.PressureRatio(m), TotalTemperature: 400}, Ambient: a}
	n := Nozzle{Kind: Convergent, Diameter: 0.1}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := NewPlume(n, c, DefaultLimits()); err != nil {
			b.Fatal(err)
		}
	}
}
