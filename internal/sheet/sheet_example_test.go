package sheet_test

import (
	"bytes"
	"fmt"
	"testing"

	"arcwright/internal/sheet"
)

// exampleT stands in for a test in examples, which have none: the fixture
// helpers only call Helper and Fatalf on it.
type exampleT struct{ testing.TB }

func (exampleT) Helper()                        {}
func (exampleT) Fatalf(format string, a ...any) { panic(fmt.Sprintf(format, a...)) }

// Build lays a plan out: here a model-jet chamber on A3, whose plan view
// takes the largest standard scale that fits.
func ExampleBuild() {
	p := chamberPlan(exampleT{})
	m, err := sheet.Build(p, sheet.Options{})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%s, plan 1:%d, elevation 1:%d, %d sheets\n", m.Paper.Name, m.Scale, m.ElevationScale, len(m.Pages))
	fmt.Printf("scale bar %s, %.0f mm long\n", m.ScaleBar.Label, m.ScaleBar.LengthMM)
	fmt.Printf("zones of %s, issued %s\n", m.Governing, m.IssueDate)
	// Output:
	// A3, plan 1:50, elevation 1:100, 3 sheets
	// scale bar 2.5 m, 50 mm long
	// zones of SP3, issued 2025-03-10
}

// Write builds and renders in one call. Asking for a scale the plan does
// not fit at is an error that names the scale and the paper that would.
func ExampleWrite() {
	p := chamberPlan(exampleT{})
	var buf bytes.Buffer
	if err := sheet.Write(&buf, p, sheet.Options{Paper: "A4"}); err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(string(buf.Bytes()[:5]))
	err := sheet.Write(&buf, p, sheet.Options{Paper: "A4", Scale: 50})
	fmt.Println(err)
	// Output:
	// %PDF-
	// sheet: scale does not fit: the scale asked for, 1:50, is too large a scale for A4: the plan spans 12.8 × 10.8 m, its stations and nozzle alone 10.0 × 7.4 m; 1:100 fits on A4; or use A3, which holds it at 1:50
}
