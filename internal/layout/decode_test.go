package layout

import (
	"math"
	"testing"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/planner"
	"arcwright/internal/units"
)

// checkF fails when got is not near want.
func checkF(t *testing.T, what string, got, want float64) {
	t.Helper()
	if !near(got, want) {
		t.Errorf("%s: got %.15g, want %.15g", what, got, want)
	}
}

// check fails when got != want.
func check[T comparable](t *testing.T, what string, got, want T) {
	t.Helper()
	if got != want {
		t.Errorf("%s: got %v, want %v", what, got, want)
	}
}

// Conversions in these tests are hand-computed from the unit definitions
// (SI Brochure 2019 prefixes and degree Celsius; 1959 yard and pound
// agreement for in and ft; NIST SP 811 App. B.8 for °F and inHg), which
// units/constants.go cites (DERIVED).

func TestDecodeHeader(t *testing.T) {
	tests := []struct {
		name  string
		text  string
		check func(t *testing.T, r *planner.Request)
	}{
		{"defaults", baseLayout, func(t *testing.T, r *planner.Request) {
			check(t, "Source", r.Source, "test.yaml")
			check(t, "Title.Title", r.Title.Title, "Test layout")
			check(t, "Units", r.Units, units.Metric)
			check(t, "Convention", r.Convention, planner.FromJetAxis)
			// Defaults: one standard atmosphere, 101 325 Pa (10th CGPM 1954,
			// CONFIRMED in units/constants.go); 15 °C, the ISO 2533:1975
			// sea-level temperature (from memory); 60 %, this format's own
			// default (common practice).
			checkF(t, "Ambient.Pressure", r.Ambient.Pressure, 101325)
			checkF(t, "Ambient.Temperature", r.Ambient.Temperature, 288.15)
			checkF(t, "Ambient.Humidity", r.Ambient.Humidity, 60)
			check(t, "Limits", r.Limits, planner.DefaultLimits())
			check(t, "Sheet", r.Sheet, planner.SheetOptions{})
		}},
		{"title block", edit(t, baseLayout, "  title: Test layout\n",
			"  title: Arc\n  facility: Somewhere Hall\n  test: T-9\n  revision: 2\n  prepared_by: P\n  checked_by: C\n  approved_by: \"\"\n  date: 2026-11-30\n"),
			func(t *testing.T, r *planner.Request) {
				want := planner.Title{Title: "Arc", Facility: "Somewhere Hall", Test: "T-9", Revision: "2", PreparedBy: "P", CheckedBy: "C", Date: "2026-11-30"}
				check(t, "Title", r.Title, want)
			}},
		{"from inlet, imperial sheet", edit(t, baseLayout, "polar_angle: from_jet_axis\n", "polar_angle: from_inlet\nunits:\n  sheet: imperial\n"),
			func(t *testing.T, r *planner.Request) {
				check(t, "Convention", r.Convention, planner.FromInlet)
				check(t, "Units", r.Units, units.Imperial)
			}},
		{"bare lengths in mm", edit(t, baseLayout, "polar_angle: from_jet_axis\n", "polar_angle: from_jet_axis\nunits:\n  length: mm\n",
			"  exit: [2, 3]", "  exit: [2000, 3000]", "[[0, 0], [8, 0], [8, 6], [0, 6], [0, 0]]", "[[0, 0], [8000, 0], [8000, 6000], [0, 6000], [0, 0]]"),
			func(t *testing.T, r *planner.Request) {
				// hand-computed: 2000 mm = 2 m (SI prefix milli).
				checkF(t, "Exit.X", r.Exit.Exit.X, 2)
				checkF(t, "Exit.Y", r.Exit.Exit.Y, 3)
				checkF(t, "Boundary[2].X", r.Cell.Boundary[2][0], 8)
			}},
		{"bare lengths in ft", edit(t, baseLayout, "polar_angle: from_jet_axis\n", "polar_angle: from_jet_axis\nunits:\n  length: ft\n",
			"  exit: [2, 3]", "  exit: [6 ft 6 in, 10]", "[[0, 0], [8, 0], [8, 6], [0, 6], [0, 0]]", "[[0, 0], [26, 0], [26, 20], [0, 20], [0, 0]]"),
			func(t *testing.T, r *planner.Request) {
				// hand-computed: 6 ft 6 in = 78 in × 0.0254 = 1.9812 m; 10 ft = 3.048 m (1959 agreement).
				checkF(t, "Exit.X", r.Exit.Exit.X, 1.9812)
				checkF(t, "Exit.Y", r.Exit.Exit.Y, 3.048)
			}},
		{"ambient", edit(t, baseLayout, "polar_angle: from_jet_axis\n", "polar_angle: from_jet_axis\nambient:\n  pressure: 29.92 inHg\n  temperature: 59 F\n  humidity: 45\n"),
			func(t *testing.T, r *planner.Request) {
				// hand-computed: 29.92 × 13595.1 × 9.80665 × 0.0254 Pa = 101320.748119 Pa;
				// (59 + 459.67)/1.8 K = 288.15 K; a bare humidity is in percent.
				checkF(t, "Ambient.Pressure", r.Ambient.Pressure, 101320.74811900273)
				checkF(t, "Ambient.Temperature", r.Ambient.Temperature, 288.15)
				checkF(t, "Ambient.Humidity", r.Ambient.Humidity, 45)
				checkF(t, "Points[0].Ambient.Pressure", r.Points[0].Ambient.Pressure, 101320.74811900273)
			}},
		{"limits", edit(t, baseLayout, "band:\n", "limits:\n  velocity: 10 ft/s\n  temperature: 50 C\n  margin: 30 cm\n  wall_clearance: 1 ft\n  stand_spacing: 5 cm\n  inflow: 2\n  far_field_ratio: 40\n  absorption: 6 dB\nband:\n"),
			func(t *testing.T, r *planner.Request) {
				// hand-computed: 10 ft/s = 3.048 m/s; 50 °C = 323.15 K; 1 ft = 0.3048 m.
				want := planner.Limits{Velocity: 3.048, Temperature: 323.15, Margin: 0.3, WallClearance: 0.3048, StandSpacing: 0.05, Inflow: 2, FarFieldRatio: 40, Absorption: 6}
				for _, f := range []struct {
					name      string
					got, want float64
				}{
					{"Velocity", r.Limits.Velocity, want.Velocity}, {"Temperature", r.Limits.Temperature, want.Temperature},
					{"Margin", r.Limits.Margin, want.Margin}, {"WallClearance", r.Limits.WallClearance, want.WallClearance},
					{"StandSpacing", r.Limits.StandSpacing, want.StandSpacing}, {"Inflow", r.Limits.Inflow, want.Inflow},
					{"FarFieldRatio", r.Limits.FarFieldRatio, want.FarFieldRatio}, {"Absorption", r.Limits.Absorption, want.Absorption},
				} {
					checkF(t, "Limits."+f.name, f.got, f.want)
				}
			}},
		{"band and sheet", edit(t, baseLayout, "  low: 200 Hz\n  high: 20 kHz\n", "  low: 50\n  high: 80 kHz\n", "arrays:\n", "sheet:\n  scale: 1:20\n  paper: Letter\narrays:\n"),
			func(t *testing.T, r *planner.Request) {
				check(t, "Band", r.Band, planner.Band{Low: 50, High: 80000})
				check(t, "Sheet", r.Sheet, planner.SheetOptions{Scale: 20, Paper: "Letter"})
			}},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			r, _ := mustDecode(t, tt.text)
			tt.check(t, r)
		})
	}
}

func TestDecodeCell(t *testing.T) {
	tests := []struct {
		name  string
		text  string
		check func(t *testing.T, r *planner.Request)
	}{
		{"anechoic defaults", baseLayout, func(t *testing.T, r *planner.Request) {
			check(t, "Kind", r.Cell.Kind, geometry.Anechoic)
			check(t, "Floor", r.Cell.Floor, geometry.Treated)
			checkF(t, "Ceiling", r.Cell.Ceiling, 4)
			check(t, "len(Boundary)", len(r.Cell.Boundary), 5)
			check(t, "Boundary[2]", r.Cell.Boundary[2], orb.Point{8, 6})
			check(t, "Collector", r.Cell.Collector, (*geometry.Collector)(nil))
			checkF(t, "CutOff", r.CutOff, 0)
		}},
		{"hard-walled", edit(t, baseLayout, "  kind: anechoic\n", "  kind: hard-walled\n"), func(t *testing.T, r *planner.Request) {
			check(t, "Kind", r.Cell.Kind, geometry.HardWalled)
			check(t, "Floor", r.Cell.Floor, geometry.Hard)
		}},
		{"outdoor open pad", edit(t, baseLayout, "  kind: anechoic\n  boundary: [[0, 0], [8, 0], [8, 6], [0, 6], [0, 0]]\n  ceiling: 4 m\n", "  kind: outdoor\n  floor: grass\n"),
			func(t *testing.T, r *planner.Request) {
				check(t, "Kind", r.Cell.Kind, geometry.OutdoorPad)
				check(t, "Floor", r.Cell.Floor, geometry.Grass)
				check(t, "Bounded", r.Cell.Bounded(), false)
				check(t, "Ceiling", math.IsInf(r.Cell.Ceiling, 1), true)
			}},
		{"outdoor site limit", edit(t, baseLayout, "  kind: anechoic\n  boundary:", "  kind: outdoor\n  site_limit:", "  ceiling: 4 m\n", ""),
			func(t *testing.T, r *planner.Request) {
				check(t, "Bounded", r.Cell.Bounded(), true)
				check(t, "Boundary[1]", r.Cell.Boundary[1], orb.Point{8, 0})
			}},
		{"treatment", edit(t, baseLayout, "  ceiling: 4 m\n", "  ceiling: 4 m\n  cutoff: 0.1 kHz\n  treatment_depth: 90 cm\n  floor: hard\n"),
			func(t *testing.T, r *planner.Request) {
				checkF(t, "CutOff", r.CutOff, 100)
				checkF(t, "TreatmentDepth", r.Cell.TreatmentDepth, 0.9)
				check(t, "Floor", r.Cell.Floor, geometry.Hard)
			}},
		{"obstacles", edit(t, baseLayout, "  ceiling: 4 m\n", `  ceiling: 4 m
  obstacles:
    - name: rig
      polygon: [[0.5, 2.5], [1.5, 2.5], [1.5, 3.5], [0.5, 3.5], [0.5, 2.5]]
      to: 2 m
    - name: column
      circle: {centre: [7, 5], radius: 300 mm}
      from: 1 m
      to: 4 m
`), func(t *testing.T, r *planner.Request) {
			check(t, "len(Obstacles)", len(r.Cell.Obstacles), 2)
			o := r.Cell.Obstacles[0]
			check(t, "Obstacles[0].Name", o.Name, "rig")
			checkF(t, "Obstacles[0].ZMin", o.ZMin, 0)
			checkF(t, "Obstacles[0].ZMax", o.ZMax, 2)
			checkF(t, "Obstacles[0].Area", o.Footprint.Area(), 1) // hand-computed: 1 m × 1 m
			c := r.Cell.Obstacles[1]
			check(t, "Obstacles[1].IsCircle", c.Footprint.IsCircle(), true)
			check(t, "Obstacles[1].Center", c.Footprint.Center, orb.Point{7, 5})
			checkF(t, "Obstacles[1].Radius", c.Footprint.Radius, 0.3)
			checkF(t, "Obstacles[1].ZMin", c.ZMin, 1)
		}},
		{"keep-outs and marks", edit(t, baseLayout, "  ceiling: 4 m\n", `  ceiling: 4 m
  keep_out:
    - name: door
      polygon: [[6, 0], [7, 0], [7, 1], [6, 1], [6, 0]]
    - name: pit
      circle: {centre: [1, 1], radius: 0.5}
  marks:
    - name: M1
      at: [1, 2]
`), func(t *testing.T, r *planner.Request) {
			check(t, "len(KeepOuts)", len(r.Cell.KeepOuts), 2)
			check(t, "KeepOuts[0].Name", r.Cell.KeepOuts[0].Name, "door")
			checkF(t, "KeepOuts[1].Radius", r.Cell.KeepOuts[1].Footprint.Radius, 0.5)
			check(t, "Marks", len(r.Cell.Marks), 1)
			check(t, "Marks[0]", r.Cell.Marks[0], geometry.Mark{Name: "M1", At: orb.Point{1, 2}})
		}},
		{"collector takes the nozzle heading", edit(t, baseLayout, "  ceiling: 4 m\n", "  ceiling: 4 m\n  collector:\n    inlet: [7, 3, 1.5]\n    diameter: 1.2 m\n"),
			func(t *testing.T, r *planner.Request) {
				want := geometry.Collector{Inlet: r3.Vec{X: 7, Y: 3, Z: 1.5}, Diameter: 1.2, Heading: 0}
				check(t, "Collector", *r.Cell.Collector, want)
			}},
		{"collector heading", edit(t, baseLayout, "  ceiling: 4 m\n", "  ceiling: 4 m\n  collector:\n    inlet: [7, 3, 1.5]\n    diameter: 1.2 m\n    heading: 10 deg\n"),
			func(t *testing.T, r *planner.Request) {
				checkF(t, "Collector.Heading", r.Cell.Collector.Heading, math.Pi/18) // hand-computed: 10° = π/18
			}},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			r, _ := mustDecode(t, tt.text)
			tt.check(t, r)
		})
	}
}

func TestDecodeNozzle(t *testing.T) {
	const shape = "  kind: convergent\n  diameter: 50.8 mm\n"
	tests := []struct {
		name  string
		text  string
		check func(t *testing.T, r *planner.Request)
	}{
		{"convergent", baseLayout, func(t *testing.T, r *planner.Request) {
			check(t, "Nozzle", r.Nozzle, jet.Nozzle{Kind: jet.Convergent, Diameter: 0.0508})
			check(t, "Exit", r.Exit, geometry.JetFrame{Exit: r3.Vec{X: 2, Y: 3, Z: 1.5}})
		}},
		{"heading", edit(t, baseLayout, "  axis_height: 1.5 m\n", "  axis_height: 1.5 m\n  heading: 90 deg\n"), func(t *testing.T, r *planner.Request) {
			checkF(t, "Heading", r.Exit.Heading, math.Pi/2) // hand-computed: 90° = π/2
		}},
		{"convergent-divergent", edit(t, baseLayout, shape, "  kind: convergent-divergent\n  diameter: 2 in\n  design_mach: 1.5\n"), func(t *testing.T, r *planner.Request) {
			check(t, "Nozzle", r.Nozzle, jet.Nozzle{Kind: jet.ConvergentDivergent, Diameter: 0.0508, DesignMach: 1.5})
		}},
		{"rectangular by sides", edit(t, baseLayout, shape, "  kind: rectangular\n  long_side: 0.5 m\n  short_side: 100 mm\n"), func(t *testing.T, r *planner.Request) {
			check(t, "Nozzle", r.Nozzle, jet.Nozzle{Kind: jet.Rectangular, Width: 0.5, Height: 0.1})
		}},
		{"rectangular by aspect ratio", edit(t, baseLayout, shape, "  kind: rectangular\n  diameter: 0.1 m\n  aspect_ratio: 4\n  design_mach: 1.2\n"), func(t *testing.T, r *planner.Request) {
			// hand-computed: area π·0.1²/4 m²; width sqrt(4·area) = 0.177245385 m, height sqrt(area/4) = 0.044311346 m.
			check(t, "Kind", r.Nozzle.Kind, jet.Rectangular)
			checkF(t, "Width", r.Nozzle.Width, 0.1772453850905516)
			checkF(t, "Height", r.Nozzle.Height, 0.0443113462726379)
			checkF(t, "DesignMach", r.Nozzle.DesignMach, 1.2)
		}},
		{"coaxial", edit(t, baseLayout, shape, "  kind: coaxial\n  diameter: 50 mm\n  secondary_diameter: 0.1 m\n",
			"    temperature_ratio: 1\n", "    temperature_ratio: 2.5\n    secondary: {npr: 1.4, total_temperature: 300 K}\n"),
			func(t *testing.T, r *planner.Request) {
				check(t, "Nozzle", r.Nozzle, jet.Nozzle{Kind: jet.Coaxial, Diameter: 0.05, SecondaryDiameter: 0.1})
				sec := r.Points[0].Secondary
				if sec == nil {
					t.Fatal("Secondary: got nil, want a stream")
				}
				check(t, "Secondary", *sec, jet.Stream{NPR: 1.4, TotalTemperature: 300, Gas: jet.Air()})
			}},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			r, _ := mustDecode(t, tt.text)
			tt.check(t, r)
		})
	}
}

func TestDecodeOperatingPoints(t *testing.T) {
	text := edit(t, baseLayout, "    temperature_ratio: 1\n", `    temperature_ratio: 1
  - name: hot
    npr: 1.86
    total_temperature: 800 K
    gamma: 1.35
    gas_constant: 290
`)
	r, _ := mustDecode(t, text)
	amb := jet.Ambient{Pressure: 101325, Temperature: 288.15}
	want := []jet.Condition{
		{Name: "P1", Primary: jet.Stream{NPR: 1.5, TemperatureRatio: 1, Gas: jet.Air()}, Ambient: amb},
		{Name: "hot", Primary: jet.Stream{NPR: 1.86, TotalTemperature: 800, Gas: jet.Gas{Gamma: 1.35, R: 290}}, Ambient: amb},
	}
	if len(r.Points) != len(want) {
		t.Fatalf("len(Points): got %d, want %d", len(r.Points), len(want))
	}
	for i, w := range want {
		t.Run(w.Name, func(t *testing.T) {
			check(t, "Name", r.Points[i].Name, w.Name)
			check(t, "Primary", r.Points[i].Primary, w.Primary)
			check(t, "Secondary", r.Points[i].Secondary, (*jet.Stream)(nil))
			checkF(t, "Ambient.Pressure", r.Points[i].Ambient.Pressure, w.Ambient.Pressure)
			checkF(t, "Ambient.Temperature", r.Points[i].Ambient.Temperature, w.Ambient.Temperature)
		})
	}
}

func TestDecodeStands(t *testing.T) {
	text := edit(t, baseLayout, "    pole_diameter: 25 mm\n", `    pole_diameter: 25 mm
  - name: boom
    base_radius: 14 in
    base_height: 0
    pole_diameter: 1 in
    boom_length: 300 mm
`)
	r, _ := mustDecode(t, text)
	want := []planner.Stand{
		{Name: "tripod", BaseRadius: 0.3, BaseHeight: DefaultBaseHeight, PoleDiameter: 0.025},
		{Name: "boom", BaseRadius: 0.3556, PoleDiameter: 0.0254, BoomLength: 0.3}, // hand-computed: 14 in = 0.3556 m
	}
	if len(r.Stands) != len(want) {
		t.Fatalf("len(Stands): got %d, want %d", len(r.Stands), len(want))
	}
	for i, w := range want {
		t.Run(w.Name, func(t *testing.T) {
			g := r.Stands[i]
			check(t, "Name", g.Name, w.Name)
			checkF(t, "BaseRadius", g.BaseRadius, w.BaseRadius)
			checkF(t, "BaseHeight", g.BaseHeight, w.BaseHeight)
			checkF(t, "PoleDiameter", g.PoleDiameter, w.PoleDiameter)
			checkF(t, "BoomLength", g.BoomLength, w.BoomLength)
		})
	}
}
