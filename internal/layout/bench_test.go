package layout

import (
	"os"
	"path/filepath"
	"testing"
)

// BenchmarkDecode decodes the anechoic demo layout, the largest of the demos.
func BenchmarkDecode(b *testing.B) {
	data, err := os.ReadFile(filepath.Join(repoRoot, "layouts", "anechoic-model-jet.yaml"))
	if err != nil {
		b.Fatal(err)
	}
	b.ReportAllocs()
	for b.Loop() {
		if _, _, err := Decode("anechoic-model-jet.yaml", data); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkDecodeBroken decodes the layout with many errors.
func BenchmarkDecodeBroken(b *testing.B) {
	data, err := os.ReadFile(filepath.Join(repoRoot, brokenDir, "several_errors.yaml"))
	if err != nil {
		b.Fatal(err)
	}
	b.ReportAllocs()
	for b.Loop() {
		if _, _, err := Decode("several_errors.yaml", data); err == nil {
			b.Fatal("got no error")
		}
	}
}
