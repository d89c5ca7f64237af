package planner_test

import (
	"path/filepath"
	"testing"

	"arcwright/internal/layout"
	"arcwright/internal/planner"
)

// BenchmarkPlanDemo plans each demo layout: the target is that planning the
// largest demo stays within twice its time before the level predictions
// (issue 11).
func BenchmarkPlanDemo(b *testing.B) {
	paths, _ := filepath.Glob("../../layouts/*.yaml")
	for _, path := range paths {
		req, _, err := layout.Load(path)
		if err != nil {
			b.Fatal(err)
		}
		b.Run(filepath.Base(path), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := planner.New(req); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

// BenchmarkNoiseMapDemo computes the noise contours of each demo, the cost
// the sheet and the GeoJSON add to a plan.
func BenchmarkNoiseMapDemo(b *testing.B) {
	paths, _ := filepath.Glob("../../layouts/*.yaml")
	for _, path := range paths {
		req, _, err := layout.Load(path)
		if err != nil {
			b.Fatal(err)
		}
		p, err := planner.New(req)
		if err != nil {
			b.Fatal(err)
		}
		b.Run(filepath.Base(path), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := p.NoiseMap(); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
