package jet

import "testing"

// BenchmarkNewPlume measures one operating point's full prediction: exit
// state, both fields and all four envelopes (target: under 100 µs).
func BenchmarkNewPlume(b *testing.B) {
	n := Nozzle{Kind: Convergent, Diameter: 0.0508}
	c := Condition{Primary: Stream{NPR: 1.8, TotalTemperature: 800}, Ambient: StandardAmbient()}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := NewPlume(n, c, DefaultLimits()); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkClearance measures one clearance query against a conservative
// envelope.
func BenchmarkClearance(b *testing.B) {
	n := Nozzle{Kind: Convergent, Diameter: 0.0508}
	c := Condition{Primary: Stream{NPR: 1.8, TotalTemperature: 800}, Ambient: StandardAmbient()}
	p, err := NewPlume(n, c, DefaultLimits())
	if err != nil {
		b.Fatal(err)
	}
	e := p.Envelope(VelocityZone, Conservative)
	b.ReportAllocs()
	i := 0
	for b.Loop() {
		x := float64(i%100) * 0.2
		e.Clearance(x, 1.5)
		i++
	}
}
