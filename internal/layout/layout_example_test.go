package layout_test

import (
	"errors"
	"fmt"

	"arcwright/internal/layout"
	"arcwright/internal/units"
)

func ExampleDecode() {
	const text = `arcwright: 1
title:
  title: Example
polar_angle: from_jet_axis
cell:
  kind: anechoic
  boundary: [[0, 0], [8 m, 0], [8 m, 6 m], [0, 6 m], [0, 0]]
  ceiling: 4 m
nozzle:
  exit: [2 m, 3 m]
  axis_height: 1.5 m
  kind: convergent
  diameter: 2 in
operating_points:
  - name: hot
    npr: 1.8
    total_temperature: 800 K
band:
  low: 200 Hz
  high: 20 kHz
arrays:
  - name: A
    arc:
      radius: 3 m
      polar: {from: 30 deg, to: 150 deg, step: 10 deg}
      height: 0 m
`
	req, _, err := layout.Decode("example.yaml", []byte(text))
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("nozzle: %v, %.4f m\n", req.Nozzle.Kind, req.Nozzle.Diameter)
	fmt.Printf("exit: (%g, %g, %g) m\n", req.Exit.Exit.X, req.Exit.Exit.Y, req.Exit.Exit.Z)
	a := req.Arrays[0]
	fmt.Printf("arc %s: %s to %s by %s, %s\n", a.Name, units.FormatAngleDeg(a.From), units.FormatAngleDeg(a.To),
		units.FormatAngleDeg(a.Step), req.Convention)

	// A broken layout gives every problem at once, each with its line.
	_, _, err = layout.Decode("broken.yaml", []byte("arcwright: 1\ntitle:\n  title: Broken\ncell:\n  ceilng: 4 m\n"))
	fmt.Println(err)
	var es layout.Errors
	fmt.Println(errors.As(err, &es), len(es), errors.Is(err, layout.ErrUnknownKey))
	// Output:
	// nozzle: convergent, 0.0508 m
	// exit: (2, 3, 1.5) m
	// arc A: 30.0° to 150.0° by 10.0°, from the downstream jet axis
	// broken.yaml:1: band: missing; want the frequency band of interest, {low: …, high: …}
	// broken.yaml:1: nozzle: missing; want the nozzle (exit, axis_height, kind, diameter, …)
	// broken.yaml:1: operating_points: missing; want a list of operating points (name, npr, total_temperature …)
	// broken.yaml:1: polar_angle: missing; want from_jet_axis or from_inlet (no default: an angle range means opposite things under the two conventions)
	// broken.yaml:4: cell.kind: missing; want the cell kind: anechoic, hard-walled or outdoor
	// broken.yaml:5: cell.ceilng: unknown key "ceilng"; did you mean "ceiling"?
	// true 6 true
}

func ExampleStarter() {
	req, warns, err := layout.Decode("starter.yaml", layout.Starter())
	fmt.Println(err == nil, len(warns), req.Title.Facility, len(req.Arrays))
	// Output:
	// true 0 Quillon Reach Acoustic Chamber 6
}

func ExampleDecodeAsBuilt() {
	const csv = `id, x, y, z, base_x, base_y
A-01, 5100, 7200, 1400, 5300, 7400
ref-1, 2 m, 7.5 m, 1.8 m, ,
`
	pos, err := layout.DecodeAsBuilt("built.csv", []byte(csv), "mm", 6)
	if err != nil {
		fmt.Println(err)
		return
	}
	a := pos["A-01"]
	fmt.Printf("A-01: mic (%.3f, %.3f, %.3f) m, pole (%.3f, %.3f) m\n", a.Mic.X, a.Mic.Y, a.Mic.Z, a.Base[0], a.Base[1])
	fmt.Println("ref-1 base derived:", pos["ref-1"].Base == nil)
	// Output:
	// A-01: mic (5.100, 7.200, 1.400) m, pole (5.300, 7.400) m
	// ref-1 base derived: true
}
