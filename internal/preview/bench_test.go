package preview_test

import (
	"os"
	"path/filepath"
	"testing"

	"arcwright/internal/preview"
)

// BenchmarkRedraw measures what a save of the layout costs before the page
// can redraw: reading and planning the file, the plan's JSON and the plan
// view's SVG, for each demo layout (target: under 100 ms for the largest).
func BenchmarkRedraw(b *testing.B) {
	demos, err := filepath.Glob("../../layouts/*.yaml")
	if err != nil || len(demos) == 0 {
		b.Fatalf("no demo layouts: %v", err)
	}
	for _, d := range demos {
		b.Run(filepath.Base(d), func(b *testing.B) {
			data, err := os.ReadFile(d)
			if err != nil {
				b.Fatal(err)
			}
			path := filepath.Join(b.TempDir(), "cell.yaml")
			if err := os.WriteFile(path, data, 0o644); err != nil {
				b.Fatal(err)
			}
			s := preview.New(path)
			if s.Version() != 1 {
				b.Fatalf("the demo did not plan")
			}
			b.ReportAllocs()
			b.ResetTimer()
			for b.Loop() {
				s.Reload()
			}
		})
	}
}
