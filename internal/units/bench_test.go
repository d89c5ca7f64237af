package units

import "testing"

// benchInputs is a fixed mix of the forms a layout file holds.
var benchInputs = []struct {
	s   string
	dim Dim
}{
	{"50.8 mm", Length},
	{"12 ft 6-1/2 in", Length},
	{"15 °C", Temperature},
	{"101.325 kPa", Pressure},
	{"30 mph", Velocity},
	{"60 %", Fraction},
}

func BenchmarkParse(b *testing.B) {
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		in := benchInputs[i%len(benchInputs)]
		if _, err := Parse(in.s, in.dim, ""); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkParseError(b *testing.B) {
	b.ReportAllocs()
	for b.Loop() {
		if _, err := Parse("15 Q", Temperature, ""); err == nil {
			b.Fatal("got nil error, want one")
		}
	}
}

func BenchmarkFormatLength(b *testing.B) {
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		sys := Metric
		if i%2 == 1 {
			sys = Imperial
		}
		_ = FormatLength(0.0492125*float64(i%100), sys)
	}
}

func BenchmarkFormatFrequency(b *testing.B) {
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		_ = FormatFrequency(12.5 * float64(1+i%1000))
	}
}
