package jet

import (
	"math"
	"testing"
)

// TestStreamExits checks that the two streams of a coaxial nozzle, each
// alone, are the single-stream states of the primary nozzle and of a round
// nozzle of the annulus's area, sqrt(0.2² − 0.1²) m (DERIVED), and that
// their mass flows add up to the mixed jet's (conservation of mass).
func TestStreamExits(t *testing.T) {
	amb := StandardAmbient()
	pri := Stream{NPR: 1.6, TotalTemperature: 700}
	sec := Stream{NPR: 1.4, TotalTemperature: 300}
	n := Nozzle{Kind: Coaxial, Diameter: 0.1, SecondaryDiameter: 0.2}
	c := Condition{Primary: pri, Secondary: &sec, Ambient: amb}
	p, s, err := StreamExits(n, c)
	if err != nil {
		t.Fatal(err)
	}
	wp, _ := ExitState(Nozzle{Kind: Convergent, Diameter: 0.1}, Condition{Primary: pri, Ambient: amb})
	ws, _ := ExitState(Nozzle{Kind: Convergent, Diameter: math.Sqrt(0.2*0.2 - 0.1*0.1)}, Condition{Primary: sec, Ambient: amb})
	if p != wp || !near(s.Diameter, ws.Diameter, 1e-12) || !near(s.MassFlow, ws.MassFlow, 1e-12) || !near(s.Velocity, ws.Velocity, 1e-12) {
		t.Errorf("got %+v and %+v, want %+v and %+v", p, s, wp, ws)
	}
	e, _ := ExitState(n, c)
	if got, want := p.MassFlow+s.MassFlow, e.MassFlow; !near(got, want, 1e-12) {
		t.Errorf("mass flow: got %g, want the mixed jet's %g", got, want)
	}
	if _, _, err := StreamExits(Nozzle{Kind: Convergent, Diameter: 0.1}, Condition{Primary: pri, Ambient: amb}); err == nil {
		t.Error("a single-stream nozzle: got no error")
	}
}
