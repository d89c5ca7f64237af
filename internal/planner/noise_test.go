package planner

import (
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/acoustics"
	"arcwright/internal/geometry"
)

// freeRoom returns a request with one microphone on a post 3 m to the side
// of the jet's source position, in an anechoic room over a treated floor
// (no floor image, no reverberant field).
func freeRoom(t *testing.T) (*Request, float64) {
	t.Helper()
	req := point(r3.Vec{})
	req.Cell.Kind, req.CutOff = geometry.Anechoic, 100
	probe := mustPlan(t, req)
	lc := probe.Points[0].CoreNominal
	req.Arrays[0].Fixed[0].At = r3.Vec{X: req.Exit.Exit.X + lc, Y: req.Exit.Exit.Y + 3, Z: req.Exit.Exit.Z}
	return req, lc
}

// TestStationLevels checks that a station's level is the source's level at
// the microphone seen from the end of the nominal core, and that the
// reported OASPL check is the loudest point.
func TestStationLevels(t *testing.T) {
	req, _ := freeRoom(t)
	p := mustPlan(t, req)
	st := p.Stations[0]
	if len(st.Levels) != len(p.Points) {
		t.Fatalf("got %d levels, want one per point (%d)", len(st.Levels), len(p.Points))
	}
	atm := acoustics.Atmosphere{Temperature: req.Ambient.Temperature, RelativeHumidity: req.Ambient.Humidity, Pressure: req.Ambient.Pressure}
	j := NoiseJet(p.Points[0].Exit)
	src, err := acoustics.NewNoiseSource(j, atm, acoustics.NoiseBands(j))
	if err != nil {
		t.Fatal(err)
	}
	// hand-computed geometry: 3 m from the source at 90° from the axis
	want, err := src.At(acoustics.Path{Distance: 3, Polar: math.Pi / 2}, nil)
	if err != nil {
		t.Fatal(err)
	}
	if got := st.Levels[0]; math.Abs(got.OASPL-want.OASPL) > 1e-6 || math.Abs(got.AWeighted-want.AWeighted) > 1e-6 {
		t.Errorf("got %+v, want %.3f dB, %.3f dB(A)", got, want.OASPL, want.AWeighted)
	}
	c := check(t, p, CheckLevel)
	if c.Value != st.Levels[0].OASPL || c.Point != p.Points[0].Name || c.Verdict != OK {
		t.Errorf("got check %+v, want the loudest level %.3f dB, ok", c, st.Levels[0].OASPL)
	}
}

// TestMicrophoneFitCheck checks the warning of a microphone whose level or
// frequency limit is too low: margin = limit − (OASPL + 15 dB crest
// allowance), hand-computed from the predicted level.
func TestMicrophoneFitCheck(t *testing.T) {
	req, _ := freeRoom(t)
	l := check(t, mustPlan(t, req), CheckLevel).Value
	tests := []struct {
		name string
		mic  acoustics.Microphone
		want Verdict
		says string
	}{
		{"fits", acoustics.Microphone{Name: "big", MaxLevel: l + 20, UpperFrequency: 100e3}, OK, "leaves 5 dB"},
		{"overloads", acoustics.Microphone{Name: "small", MaxLevel: l + 10, UpperFrequency: 100e3}, Warn, "exceeds the small microphone's"},
		{"too slow", acoustics.Microphone{Name: "slow", MaxLevel: l + 40, UpperFrequency: 10e3}, Warn, "above the slow microphone's 10 kHz"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			r, _ := freeRoom(t)
			m := tt.mic
			r.Arrays[0].Microphone = &m
			c := check(t, mustPlan(t, r), CheckLevel)
			if c.Verdict != tt.want || !strings.Contains(c.Reason, tt.says) {
				t.Errorf("got %v %q, want %v saying %q", c.Verdict, c.Reason, tt.want, tt.says)
			}
		})
	}
	// the stand's microphone applies when the array names none
	r, _ := freeRoom(t)
	r.Stands[0].Microphone = &acoustics.Microphone{Name: "small", MaxLevel: l, UpperFrequency: 100e3}
	if c := check(t, mustPlan(t, r), CheckLevel); c.Verdict != Warn {
		t.Errorf("stand's microphone: got %v, want warn", c.Verdict)
	}
}

// TestRoomLevels checks the reverberant field of a hard-walled room: with
// less absorption the level rises, the assumed absorption is warned, and a
// reverberation time gives ᾱ by Eyring's formula ᾱ = 1 − exp(−0.161·V/(S·T60))
// (Eyring 1930, FROM MEMORY, textbook; hand-computed: 10 × 10 × 5 m room,
// V = 500 m³, S = 400 m², T60 = 1 s: ᾱ = 1 − exp(−0.20125) = 0.18229, where
// Sabine's formula gives 0.20125), and an average absorption coefficient
// outside 0.01–0.99 (ours: a plausible range) is refused.
func TestRoomLevels(t *testing.T) {
	level := func(n Noise) (float64, *Plan) {
		req, _ := freeRoom(t)
		req.Cell.Kind = geometry.HardWalled
		req.Noise = n
		p := mustPlan(t, req)
		return check(t, p, CheckLevel).Value, p
	}
	dead, _ := level(Noise{RoomAbsorption: 0.5})
	live, p := level(Noise{})
	if !(live > dead) {
		t.Errorf("got %.2f dB with ᾱ = 0.02 and %.2f dB with 0.5, want more in the live room", live, dead)
	}
	found := false
	for _, w := range p.Warnings {
		found = found || strings.Contains(w, "absorption is not given")
	}
	if !found {
		t.Errorf("no warning about the assumed absorption: %v", p.Warnings)
	}
	eyring, _ := level(Noise{Reverberation: 1})
	same, _ := level(Noise{RoomAbsorption: 0.182292})
	if math.Abs(eyring-same) > 1e-4 {
		t.Errorf("T60 1 s: got %.4f dB, want %.4f dB (ᾱ = 0.18229)", eyring, same)
	}
	for _, n := range []Noise{{Reverberation: 0.01}, {RoomAbsorption: 1e-300}, {RoomAbsorption: 0.995}} {
		req, _ := freeRoom(t)
		req.Cell.Kind = geometry.HardWalled
		req.Noise = n
		if _, err := New(req); err == nil || !strings.Contains(err.Error(), "0.01–0.99") {
			t.Errorf("%+v: got %v, want an error naming the plausible range 0.01–0.99", n, err)
		}
	}
}

// TestLevelErrorReason checks that a level that cannot be predicted (a
// microphone at the source position (acoustics.MinSourceDistance), where a far-field prediction gives
// hundreds of dB) blocks the station with the real reason, keeps one level
// entry per operating point, and never reads as predicted.
func TestLevelErrorReason(t *testing.T) {
	req, lc := freeRoom(t)
	req.Arrays[0].Fixed[0].At = req.Exit.ToCell(geometry.JetPoint{X: lc})
	p := mustPlan(t, req)
	c := check(t, p, CheckLevel)
	if c.Verdict != Blocked || !strings.Contains(c.Reason, "within 2 jet diameters") {
		t.Errorf("got %v %q, want blocked: within 2 jet diameters of the source position", c.Verdict, c.Reason)
	}
	if st := p.Stations[0]; len(st.Levels) != len(p.Points) || !math.IsNaN(st.Levels[0].OASPL) {
		t.Errorf("got levels %+v, want one entry per point (%d), not predicted (NaN)", st.Levels, len(p.Points))
	}
	// the rule is the noise command's: 1.5 Dj off the source is refused,
	// 2.5 Dj is predicted
	dj := p.Points[0].Exit.FullyExpandedDiameter
	for _, k := range []float64{1.5, 2.5} {
		req.Arrays[0].Fixed[0].At = req.Exit.ToCell(geometry.JetPoint{X: lc, R: k * dj})
		p := mustPlan(t, req)
		c := check(t, p, CheckLevel)
		if refused := strings.Contains(c.Reason, "within 2 jet diameters"); refused != (k < acoustics.MinSourceDistance) {
			t.Errorf("%g Dj from the source: got %v %q, want refused %v", k, c.Verdict, c.Reason, k < acoustics.MinSourceDistance)
		}
	}
}

// TestCrewExposure checks the crew table against the EU 2003/10/EC values
// and the NIOSH allowed time (acoustics.md §7.1, CONFIRMED): the status
// follows the level at the position and the hours spent there.
func TestCrewExposure(t *testing.T) {
	req, lc := freeRoom(t)
	near := r3.Vec{X: req.Exit.Exit.X + lc, Y: req.Exit.Exit.Y + 1, Z: req.Exit.Exit.Z}
	req.Crew = []Crew{{Name: "near", At: near, Hours: 8}, {Name: "brief", At: near, Hours: 1.0 / 3600}}
	p := mustPlan(t, req)
	if len(p.Crew) != 2*len(p.Points) {
		t.Fatalf("got %d crew entries, want %d", len(p.Crew), 2*len(p.Points))
	}
	for _, e := range p.Crew {
		wantAllowed := 8 / math.Pow(2, (e.AWeighted-85)/3)
		if math.Abs(e.AllowedHours-wantAllowed) > 1e-9*wantAllowed {
			t.Errorf("%s: got %.4g h allowed, want %.4g h", e.Name, e.AllowedHours, wantAllowed)
		}
		lex := e.AWeighted + 10*math.Log10(e.Hours/8)
		var want Verdict
		switch {
		case lex >= 87 || e.Peak >= 140 || e.Hours > e.AllowedHours:
			want = Blocked
		case lex >= 80 || e.Peak >= 135:
			want = Warn
		default:
			want = OK
		}
		if e.Status != want || math.Abs(e.DailyExposure-lex) > 1e-9 {
			t.Errorf("%s: %.1f dB(A) for %g h (L_EX,8h %.1f), peak %.1f: got %v, want %v", e.Name, e.AWeighted, e.Hours, e.DailyExposure, e.Peak, e.Status, want)
		}
	}
	if p.Crew[0].Status != Blocked {
		t.Errorf("8 h at %.0f dB(A): got %v, want blocked", p.Crew[0].AWeighted, p.Crew[0].Status)
	}
}

// TestCrewInZone checks that a crew position inside a conservative zone (or
// its margin) is blocked whatever the noise says.
func TestCrewInZone(t *testing.T) {
	req, lc := freeRoom(t)
	onAxis := r3.Vec{X: req.Exit.Exit.X + 2*lc, Y: req.Exit.Exit.Y, Z: req.Exit.Exit.Z}
	req.Crew = []Crew{{Name: "in the jet", At: onAxis, Hours: 1.0 / 3600}}
	p := mustPlan(t, req)
	for _, e := range p.Crew {
		if e.Status != Blocked || !strings.Contains(e.Reason, "inside the velocity zone") {
			t.Errorf("%s: got %v %q, want blocked inside the velocity zone", e.Point, e.Status, e.Reason)
		}
	}
}

// TestCrewUncertainty checks that a crew position whose central estimate
// is below the EU lower action value (80 dB(A) L_EX,8h; acoustics.md §7.1,
// CONFIRMED) but whose estimate plus its stated uncertainty reaches it is
// warned, and the reason says so: the hours are chosen so that the central
// L_EX,8h is 80 dB(A) less half the uncertainty (DERIVED from
// L_EX,8h = L_A + 10·log10(T/8 h)).
func TestCrewUncertainty(t *testing.T) {
	req, lc := freeRoom(t)
	at := r3.Vec{X: req.Exit.Exit.X + lc, Y: req.Exit.Exit.Y + 3, Z: req.Exit.Exit.Z}
	req.Crew = []Crew{{Name: "probe", At: at, Hours: 8}}
	e := mustPlan(t, req).Crew[0]
	u := e.AWeighted - e.DailyExposure // 0 for 8 h
	levels, err := New(req)
	if err != nil {
		t.Fatal(err)
	}
	unc := levels.Stations[0].Levels[0].Uncertainty
	hours := 8 * math.Pow(10, (80-unc/2-e.AWeighted+u)/10)
	req.Crew[0].Hours = hours
	e = mustPlan(t, req).Crew[0]
	if !(e.DailyExposure < 80 && e.DailyExposure+unc >= 80) || e.Peak+unc >= 135 || hours > e.AllowedHours {
		t.Fatalf("set-up: L_EX,8h %.1f ± %.0f dB(A), peak %.0f dB(C), %.3g h of %.3g h allowed: want only the uncertainty to reach 80 dB(A)", e.DailyExposure, unc, e.Peak, hours, e.AllowedHours)
	}
	if e.Status != Warn || !strings.Contains(e.Reason, "with the ±") {
		t.Errorf("got %v %q, want warn, the reason naming the uncertainty", e.Status, e.Reason)
	}
}

// TestCrewAllowedHoursCap checks that the NIOSH allowed time is capped at
// a day (24 h), as the tables print "> 24 h": a quiet position far from
// the jet would otherwise be allowed months.
func TestCrewAllowedHoursCap(t *testing.T) {
	req, lc := freeRoom(t)
	req.Crew = []Crew{{Name: "far", At: r3.Vec{X: req.Exit.Exit.X + lc, Y: req.Exit.Exit.Y + 2000, Z: 1.6}, Hours: 8}}
	e := mustPlan(t, req).Crew[0]
	if e.AllowedHours != MaxAllowedHours || MaxAllowedHours != 24 {
		t.Errorf("got %g h allowed at %.0f dB(A), want the cap of 24 h", e.AllowedHours, e.AWeighted)
	}
}

// TestGrassFloorLevels checks that a grass floor adds the floor image (at
// least its energy, +3 dB for equal paths; acoustics.md §3.1, FROM MEMORY,
// high): real ground is nearly rigid at low frequencies, so leaving the
// image out reads up to 3–6 dB low. A treated floor adds none, and a
// hard floor's coherent sum is never above grass's.
func TestGrassFloorLevels(t *testing.T) {
	level := func(f geometry.Surface) (float64, float64) {
		req, lc := freeRoom(t)
		req.Cell.Floor = f
		req.Crew = []Crew{{Name: "c", At: r3.Vec{X: req.Exit.Exit.X + lc, Y: req.Exit.Exit.Y - 3, Z: req.Exit.Exit.Z}, Hours: 1}}
		p := mustPlan(t, req)
		return check(t, p, CheckLevel).Value, p.Crew[0].AWeighted
	}
	treated, treatedA := level(geometry.Treated)
	grass, grassA := level(geometry.Grass)
	hard, hardA := level(geometry.Hard)
	// mic and source at the same height h, 3 m apart: image path
	// √(9 + 4h²); the energy sum adds 10·log10(1 + 9/(9 + 4h²)) (DERIVED)
	req, _ := freeRoom(t)
	h := req.Exit.Exit.Z
	energy := 10 * math.Log10(1+9/(9+4*h*h))
	for _, c := range []struct {
		name         string
		treated, got float64
		hard         float64
	}{{"station OASPL", treated, grass, hard}, {"crew dB(A)", treatedA, grassA, hardA}} {
		if d := c.got - c.treated; d < energy-0.05 || d > 6.03 {
			t.Errorf("%s: grass adds %+.2f dB over a treated floor, want from the energy sum %+.2f dB to +6.02 dB", c.name, d, energy)
		}
		if c.hard > c.got+1e-9 {
			t.Errorf("%s: hard floor %.2f dB above grass %.2f dB", c.name, c.hard, c.got)
		}
	}
}
