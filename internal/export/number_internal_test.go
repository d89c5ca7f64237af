package export

import (
	"math"
	"testing"
)

// The rounding rules of the package documentation, on hand-computed cases.
func TestNumbers(t *testing.T) {
	inf := math.Inf(1)
	for _, c := range []struct {
		name string
		got  num
		want string
	}{
		{"length rounds to 0.1 mm", metres(1.23456), "1.2346"},
		{"length rounds down", metres(2.598076211), "2.5981"},
		{"negative length", metres(-0.08714), "-0.0871"},
		{"tiny negative length is 0, not -0", metres(-0.00001), "0"},
		{"negative zero", metres(math.Copysign(0, -1)), "0"},
		{"60 degrees", degrees(math.Pi / 3), "60"},
		{"115.0876 degrees", degrees(115.0876 * math.Pi / 180), "115.09"},
		{"6 significant digits", sig(123456.7), "123457"},
		{"6 significant digits, small", sig(0.00406321987), "0.00406322"},
		{"large Reynolds number", sig(1.2345678e6), "1234570"},
		{"below 1e-6", sig(1.5e-9), "1.5e-09"},
		{"NaN", sig(math.NaN()), "null"},
		{"+Inf length", metres(inf), "null"},
		{"-Inf angle", degrees(-inf), "null"},
		{"beyond the rounding limit", metres(3e15), "3000000000000000"},
	} {
		t.Run(c.name, func(t *testing.T) {
			b, err := c.got.MarshalJSON()
			if err != nil {
				t.Fatal(err)
			}
			if string(b) != c.want {
				t.Errorf("got %s, want %s", b, c.want)
			}
		})
	}
}

func TestCells(t *testing.T) {
	for _, c := range []struct {
		name, got, want string
	}{
		{"metres 4 decimals", cellMetres(1.5), "1.5000"},
		{"metres rounding", cellMetres(2.598076211), "2.5981"},
		{"no negative zero", cellMetres(-0.00001), "0.0000"},
		{"degrees 2 decimals", cellDegrees(math.Pi / 2), "90.00"},
		{"degrees rounding", cellDegrees(115.0876 * math.Pi / 180), "115.09"},
		{"NaN is empty", cellMetres(math.NaN()), ""},
		{"Inf is empty", cellDegrees(math.Inf(-1)), ""},
	} {
		t.Run(c.name, func(t *testing.T) {
			if c.got != c.want {
				t.Errorf("got %q, want %q", c.got, c.want)
			}
		})
	}
}
