package sheet_test

import (
	"io"
	"testing"

	"arcwright/internal/sheet"
)

// BenchmarkWrite500 measures a 500-station sheet, built and rendered
// (target: under 500 ms).
func BenchmarkWrite500(b *testing.B) {
	p := padPlan(b, 500)
	b.ReportAllocs()
	b.ResetTimer()
	for b.Loop() {
		if err := sheet.Write(io.Discard, p, sheet.Options{}); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkBuild500(b *testing.B) {
	p := padPlan(b, 500)
	b.ReportAllocs()
	b.ResetTimer()
	for b.Loop() {
		if _, err := sheet.Build(p, sheet.Options{}); err != nil {
			b.Fatal(err)
		}
	}
}
