package layout

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/planner"
)

// arcBlock is the array section of baseLayout, which these tests replace.
const arcBlock = `  - name: A
    stand: tripod
    arc:
      radius: 3 m
      polar: {from: 30 deg, to: 150 deg, step: 10 deg}
`

// deg converts degrees to radians for expected values (hand-computed:
// 1° = π/180 rad exactly, SI Brochure 2019; DERIVED).
func deg(d float64) float64 { return d * math.Pi / 180 }

func TestDecodeArrays(t *testing.T) {
	tests := []struct {
		name  string
		block string
		want  planner.Array // Line is not compared
	}{
		{"arc", arcBlock, planner.Array{Name: "A", Kind: planner.Arc, Stand: "tripod", Incidence: planner.NormalIncidence,
			Radius: 3, From: deg(30), To: deg(150), Step: deg(10)}},
		{"arc auto, horizontal, grazing", `  - name: B
    stand: tripod
    first_channel: 5
    aim: grazing
    arc:
      centre: 0.5 m
      radius: auto
      polar: {from: 150, to: 30, step: 15}
      azimuth: 90 deg
      height: 1.2 m
`, planner.Array{Name: "B", Kind: planner.Arc, Stand: "tripod", Incidence: planner.GrazingIncidence, FirstChannel: 5,
			CenterX: 0.5, AutoRadius: true, From: deg(150), To: deg(30), Step: deg(15), Azimuth: deg(90), Height: 1.2, HasHeight: true}},
		{"line by axial range", `  - name: S
    stand: tripod
    line:
      offset: 2 m
      from: -0.5 m
      to: 3 m
      spacing: 25 cm
      azimuth: 180 deg
`, planner.Array{Name: "S", Kind: planner.Line, Stand: "tripod", Incidence: planner.NormalIncidence,
			Offset: 2, XFrom: -0.5, XTo: 3, Spacing: 0.25, Azimuth: math.Pi}},
		{"line by polar angles", `  - name: S
    stand: tripod
    line:
      offset: 1.5 m
      polar: {from: 40 deg, to: 140 deg, step: 10 deg}
      centre: 0.2 m
      height: 1 m
`, planner.Array{Name: "S", Kind: planner.Line, Stand: "tripod", Incidence: planner.NormalIncidence,
			Offset: 1.5, From: deg(40), To: deg(140), Step: deg(10), CenterX: 0.2, Height: 1, HasHeight: true}},
		{"near field", `  - name: N
    stand: tripod
    near_field:
      clearance: 150 mm
      from: 0.1 m
      to: 1.5 m
      spacing: 0.1 m
      azimuth: 270 deg
`, planner.Array{Name: "N", Kind: planner.NearField, Stand: "tripod", Incidence: planner.NormalIncidence,
			Clearance: 0.15, XFrom: 0.1, XTo: 1.5, Spacing: 0.1, Azimuth: deg(270)}},
		{"ring by count", `  - name: R
    stand: tripod
    ring:
      x: 1 m
      radius: 0.8 m
      count: 12
`, planner.Array{Name: "R", Kind: planner.Ring, Stand: "tripod", Incidence: planner.NormalIncidence,
			RingX: 1, Radius: 0.8, AzFrom: 0, AzStep: 2 * math.Pi / 12, AzTo: 2*math.Pi - 2*math.Pi/12, FullTurn: true}},
		{"ring by range", `  - name: R
    stand: tripod
    ring:
      x: 1 m
      radius: 0.8 m
      azimuth: {from: 0 deg, to: 330 deg, step: 30 deg}
`, planner.Array{Name: "R", Kind: planner.Ring, Stand: "tripod", Incidence: planner.NormalIncidence,
			RingX: 1, Radius: 0.8, AzFrom: 0, AzTo: deg(330), AzStep: deg(30)}},
		{"points", `  - name: P
    points:
      - name: ref-1
        at: [1, 1, 0]
        channel: 40
      - at: [2, 1, 0 m]
`, planner.Array{Name: "P", Kind: planner.Points, Incidence: planner.NormalIncidence, Fixed: []planner.Fixed{
			{Name: "ref-1", At: r3.Vec{X: 1, Y: 1}, Channel: 40}, {At: r3.Vec{X: 2, Y: 1}}}}},
		{"probes", `  - name: T
    stand: tripod
    probes:
      - name: rake
        at: [4 m, 2 m, 1.5 m]
      - at: [5 m, 2 m, 1.5 m]
`, planner.Array{Name: "T", Kind: planner.Probes, Stand: "tripod", Incidence: planner.NormalIncidence, Fixed: []planner.Fixed{
			{Name: "rake", At: r3.Vec{X: 4, Y: 2, Z: 1.5}}, {At: r3.Vec{X: 5, Y: 2, Z: 1.5}}}}},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			r, _ := mustDecode(t, edit(t, baseLayout, arcBlock, tt.block))
			if len(r.Arrays) != 1 {
				t.Fatalf("len(Arrays): got %d, want 1", len(r.Arrays))
			}
			compareArray(t, r.Arrays[0], tt.want)
		})
	}
}

// compareArray compares every field of got with want, floats to relTol;
// Line fields are only required to be set.
func compareArray(t *testing.T, got, want planner.Array) {
	t.Helper()
	check(t, "Name", got.Name, want.Name)
	check(t, "Kind", got.Kind, want.Kind)
	check(t, "Stand", got.Stand, want.Stand)
	check(t, "Incidence", got.Incidence, want.Incidence)
	check(t, "FirstChannel", got.FirstChannel, want.FirstChannel)
	check(t, "AutoRadius", got.AutoRadius, want.AutoRadius)
	check(t, "HasHeight", got.HasHeight, want.HasHeight)
	check(t, "FullTurn", got.FullTurn, want.FullTurn)
	if got.Line <= 0 {
		t.Errorf("Line: got %d, want > 0", got.Line)
	}
	for _, f := range []struct {
		name      string
		got, want float64
	}{
		{"CenterX", got.CenterX, want.CenterX}, {"Radius", got.Radius, want.Radius},
		{"From", got.From, want.From}, {"To", got.To, want.To}, {"Step", got.Step, want.Step},
		{"Azimuth", got.Azimuth, want.Azimuth}, {"Height", got.Height, want.Height},
		{"Offset", got.Offset, want.Offset}, {"XFrom", got.XFrom, want.XFrom}, {"XTo", got.XTo, want.XTo},
		{"Spacing", got.Spacing, want.Spacing}, {"Clearance", got.Clearance, want.Clearance},
		{"RingX", got.RingX, want.RingX}, {"AzFrom", got.AzFrom, want.AzFrom}, {"AzTo", got.AzTo, want.AzTo}, {"AzStep", got.AzStep, want.AzStep},
	} {
		checkF(t, f.name, f.got, f.want)
	}
	if len(got.Fixed) != len(want.Fixed) {
		t.Fatalf("len(Fixed): got %d, want %d", len(got.Fixed), len(want.Fixed))
	}
	for i, w := range want.Fixed {
		g := got.Fixed[i]
		check(t, "Fixed.Name", g.Name, w.Name)
		check(t, "Fixed.At", g.At, w.At)
		check(t, "Fixed.Channel", g.Channel, w.Channel)
		if g.Line <= 0 {
			t.Errorf("Fixed[%d].Line: got %d, want > 0", i, g.Line)
		}
	}
}

func TestSteps(t *testing.T) {
	tests := []struct {
		name       string
		a, b, step float64
		want       float64
	}{
		// hand-computed counts: ⌊|b−a|/step⌋ + 1.
		{"30 to 150 by 10 deg", deg(30), deg(150), deg(10), 13},
		{"reversed", deg(150), deg(30), deg(10), 13},
		{"not a whole number of steps", 0, 1, 0.3, 4},
		{"single station", 1, 1, 0.5, 1},
		{"0 to 3 m by 1 mm", 0, 3, 0.001, 3001},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if got := steps(tt.a, tt.b, tt.step); got != tt.want {
				t.Errorf("steps(%g, %g, %g): got %g, want %g", tt.a, tt.b, tt.step, got, tt.want)
			}
		})
	}
}
