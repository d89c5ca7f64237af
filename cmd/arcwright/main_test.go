package main

import (
	"bytes"
	"encoding/json"
	"flag"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/spf13/cobra"
)

var update = flag.Bool("update", false, "rewrite the golden files")

// arc runs the command line and returns its output and exit status.
func arc(t *testing.T, args ...string) (stdout, stderr string, code int) {
	t.Helper()
	var o, e bytes.Buffer
	code = run(args, &o, &e)
	return o.String(), e.String(), code
}

const demoDir = "../../layouts"

var demos = []string{"anechoic-model-jet", "outdoor-static-pad", "hard-wall-exhaust-room"}

// TestHelp checks that every command has help that ends with its exit
// statuses.
func TestHelp(t *testing.T) {
	root := newRootCommand(&bytes.Buffer{}, &bytes.Buffer{})
	for _, c := range root.Commands() {
		if c.Name() == "help" || c.Name() == "completion" {
			continue
		}
		t.Run(c.Name(), func(t *testing.T) {
			out, errOut, code := arc(t, c.Name(), "--help")
			if code != exitOK || errOut != "" {
				t.Fatalf("exit %d, stderr %q", code, errOut)
			}
			if !strings.Contains(out, "Exit status:") || !strings.Contains(out, "Usage:") {
				t.Errorf("help of %s lacks usage or exit statuses:\n%s", c.Name(), out)
			}
		})
	}
	out, _, code := arc(t, "--version")
	if code != 0 || !strings.HasPrefix(out, "arcwright ") {
		t.Errorf("--version: exit %d, %q", code, out)
	}
	if out, _, code := arc(t, "completion", "bash"); code != 0 || !strings.Contains(out, "arcwright") {
		t.Errorf("completion: exit %d", code)
	}
}

// TestUsageErrors checks unknown commands and flags exit 2 with a pointer
// to the help.
func TestUsageErrors(t *testing.T) {
	for _, args := range [][]string{{"plna"}, {"plan", "--pfd", "x.pdf", "a.yaml"}, {"plume", "--npr"}} {
		_, errOut, code := arc(t, args...)
		if code != exitUsage || !strings.Contains(errOut, "arcwright help") {
			t.Errorf("%v: exit %d, stderr %q", args, code, errOut)
		}
	}
}

// TestPlumeFlags checks argv → options: units on flags, bare numbers in SI.
func TestPlumeFlags(t *testing.T) {
	o := &PlumeOptions{}
	c := &cobra.Command{Use: "plume"}
	o.AddFlags(c.Flags())
	if err := c.ParseFlags([]string{"--diameter", "2in", "--npr=1.86", "--total-temperature", "527 C", "--at", "0.5m,1 m", "--at", "2", "--ambient-pressure", "14.7psi"}); err != nil {
		t.Fatal(err)
	}
	if o.Diameter != 0.0508 || o.NPR != 1.86 || o.TotalTemperature != 800.15 {
		t.Errorf("got D %g, NPR %g, T0 %g", o.Diameter, o.NPR, o.TotalTemperature)
	}
	if len(o.At) != 3 || o.At[0] != 0.5 || o.At[2] != 2 {
		t.Errorf("got --at %v", o.At)
	}
	if d := o.AmbientPressure - 101352.9; d > 1 || d < -1 {
		t.Errorf("got ambient pressure %g Pa, want 14.7 psi", o.AmbientPressure)
	}
	if o.AmbientTemperature != 288.15 || o.VelocityLimit != 5 || o.TemperatureLimit != 323.15 {
		t.Errorf("defaults: got %g K, %g m/s, %g K", o.AmbientTemperature, o.VelocityLimit, o.TemperatureLimit)
	}
}

// TestPlume checks options → output in each format.
func TestPlume(t *testing.T) {
	base := []string{"plume", "--diameter", "50.8mm", "--npr", "1.86", "--total-temperature", "800K"}
	out, errOut, code := arc(t, base...)
	if code != 0 {
		t.Fatalf("exit %d: %s", code, errOut)
	}
	for _, want := range []string{"Fully expanded exit state", "velocity Uj", "Potential core", "Zones", "velocity, conservative (for clearances)", "buoyant"} {
		if !strings.Contains(out, want) {
			t.Errorf("text output lacks %q", want)
		}
	}
	out, _, code = arc(t, append(base, "--format", "json", "--at", "0.3m")...)
	var doc struct {
		Exit struct {
			Velocity float64 `json:"velocity_m_s"`
		} `json:"exit"`
		Profile []struct {
			X float64 `json:"x_m"`
		} `json:"profile"`
	}
	if code != 0 || json.Unmarshal([]byte(out), &doc) != nil || doc.Exit.Velocity < 500 || doc.Exit.Velocity > 520 {
		t.Fatalf("json: exit %d, velocity %g", code, doc.Exit.Velocity)
	}
	found := false
	for _, r := range doc.Profile {
		found = found || r.X == 0.3
	}
	if !found {
		t.Errorf("--at 0.3m row missing from %v", doc.Profile)
	}
	out, _, code = arc(t, append(base, "--format", "csv")...)
	if code != 0 || !strings.HasPrefix(out, "x_m,") {
		t.Errorf("csv: exit %d, %q", code, out[:min(len(out), 40)])
	}
	out, errOut, code = arc(t, "plume", "--layout", demoDir+"/anechoic-model-jet.yaml", "--point", "HS-090")
	if code != 0 || !strings.Contains(out, "Zones") {
		t.Errorf("--layout: exit %d, %s", code, errOut)
	}
}

// TestPlumeErrors checks that bad input names the flag and what was
// expected, and exits non-zero.
func TestPlumeErrors(t *testing.T) {
	base := []string{"plume", "--diameter", "50.8mm", "--temperature-ratio", "1"}
	tests := []struct {
		name string
		args []string
		code int
		want string
	}{
		{"NPR below 1", append(base, "--npr", "0.8"), exitUsage, `"--npr" flag: the nozzle pressure ratio 0.8 is implausible; want 1.001 to 50`},
		{"temperature on a length", []string{"plume", "--diameter", "15C", "--npr", "1.5", "--temperature-ratio", "1"}, exitUsage, `invalid argument "15C" for "--diameter" flag: want a length, got "15C"`},
		{"unknown unit", []string{"plume", "--diameter", "5 furlongs", "--npr", "1.5", "--temperature-ratio", "1"}, exitUsage, `"--diameter"`},
		{"negative diameter", []string{"plume", "--diameter", "-5mm", "--npr", "1.5", "--temperature-ratio", "1"}, exitUsage, `"--diameter" flag: the nozzle dimension -5.0 mm is implausible`},
		{"gamma 1", append(base, "--npr", "1.5", "--gamma", "1"), exitUsage, `"--gamma" flag: the ratio of specific heats 1 is implausible; want above 1`},
		{"no NPR", base, exitUsage, "--npr is required"},
		{"no temperature", []string{"plume", "--diameter", "1in", "--npr", "1.5"}, exitUsage, "exactly one of --total-temperature and --temperature-ratio"},
		{"limit below ambient", append(base, "--npr", "1.5", "--temperature-limit", "10C"), exitUsage, "--temperature-limit: temperature limit"},
		{"unknown point", []string{"plume", "--layout", demoDir + "/anechoic-model-jet.yaml", "--point", "XX"}, exitUsage, `--point: no operating point named "XX"`},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			out, errOut, code := arc(t, tt.args...)
			if code != tt.code || !strings.Contains(errOut, tt.want) {
				t.Errorf("exit %d (want %d), stderr %q, want it to contain %q", code, tt.code, errOut, tt.want)
			}
			if out != "" {
				t.Errorf("stdout should be empty on error, got %q", out)
			}
		})
	}
}

// TestAir checks the absorption table with and without a layout.
func TestAir(t *testing.T) {
	out, errOut, code := arc(t, "air", "--temperature", "20C", "--humidity", "70%", "--from", "1kHz", "--to", "10kHz", "--distance", "3m", "--format", "json")
	if code != 0 {
		t.Fatalf("exit %d: %s", code, errOut)
	}
	var doc struct {
		Bands []struct {
			F    float64   `json:"frequency_hz"`
			DB   float64   `json:"db_per_m"`
			Loss []float64 `json:"loss_db"`
		} `json:"bands"`
	}
	if err := json.Unmarshal([]byte(out), &doc); err != nil {
		t.Fatal(err)
	}
	if len(doc.Bands) != 11 {
		t.Fatalf("got %d bands from 1 to 10 kHz, want 11", len(doc.Bands))
	}
	// ISO 9613-1 at 20 °C, 70 %, 10 kHz (an exact base-ten centre):
	// 0.117507 dB/m (acoustics reference sheet §1.5, COMPUTED; matches the
	// ISO 9613-1 Table 1 transcription 105–117 dB/km range, CONFIRMED)
	last := doc.Bands[10]
	if last.F != 10000 || last.DB < 0.11750 || last.DB > 0.11751 || len(last.Loss) != 1 {
		t.Errorf("10 kHz row: %+v", last)
	}
	if _, errOut, code := arc(t, "air", "--temperature", "20C"); code != exitUsage || !strings.Contains(errOut, "--humidity") {
		t.Errorf("missing humidity: exit %d, %q", code, errOut)
	}
	out, _, code = arc(t, "air", demoDir+"/anechoic-model-jet.yaml")
	if code != 0 || !strings.Contains(out, "80 kHz") {
		t.Errorf("layout: exit %d\n%s", code, out)
	}
	out, _, code = arc(t, "air", "--temperature", "20C", "--humidity", "70", "--format", "csv")
	if code != 0 || !strings.HasPrefix(out, "band,frequency_hz,db_per_m") {
		t.Errorf("csv: exit %d, %q", code, out[:min(40, len(out))])
	}
}

// TestValidate checks the demos validate and a broken layout reports every
// problem with its file and line, exiting 1.
func TestValidate(t *testing.T) {
	for _, d := range demos {
		out, errOut, code := arc(t, "validate", filepath.Join(demoDir, d+".yaml"))
		if code != 0 || !strings.Contains(out, "valid") || !strings.Contains(out, "stations") {
			t.Errorf("%s: exit %d, %s%s", d, code, out, errOut)
		}
	}
	_, errOut, code := arc(t, "validate", "../../testdata/layouts/broken/unknown_key.yaml")
	if code != exitError || !strings.Contains(errOut, `unknown_key.yaml:9: cell.ceilng: unknown key "ceilng"; did you mean "ceiling"?`) {
		t.Errorf("exit %d, stderr %q", code, errOut)
	}
	if _, errOut, code := arc(t, "validate", "no-such-file.yaml"); code != exitError || !strings.Contains(errOut, "no-such-file.yaml") {
		t.Errorf("missing file: exit %d, %q", code, errOut)
	}
}

// TestInit checks the starter is written, refused a second time without
// --force, and valid.
func TestInit(t *testing.T) {
	path := filepath.Join(t.TempDir(), "mine.yaml")
	if _, errOut, code := arc(t, "init", path); code != 0 {
		t.Fatalf("exit %d: %s", code, errOut)
	}
	if _, errOut, code := arc(t, "init", path); code != exitError || !strings.Contains(errOut, "already exists; use --force") {
		t.Errorf("second init: exit %d, %q", code, errOut)
	}
	if _, _, code := arc(t, "init", "--force", path); code != 0 {
		t.Errorf("--force: exit %d", code)
	}
	if out, errOut, code := arc(t, "validate", path); code != 0 {
		t.Errorf("starter does not validate: %s%s", out, errOut)
	}
	if out, errOut, code := arc(t, "plan", path); code != 0 || !strings.Contains(out, "stations") {
		t.Errorf("starter does not plan: %s%s", out, errOut)
	}
}

// TestPlanGolden runs plan on each demo layout end to end and compares the
// JSON with a golden file (go test ./cmd/arcwright -update to refresh).
func TestPlanGolden(t *testing.T) {
	for _, d := range demos {
		t.Run(d, func(t *testing.T) {
			out, errOut, code := arc(t, "plan", filepath.Join(demoDir, d+".yaml"), "--format", "json")
			if code != 0 {
				t.Fatalf("exit %d: %s", code, errOut)
			}
			golden := filepath.Join("../../testdata/plans", d+".json")
			if *update {
				if err := os.WriteFile(golden, []byte(out), 0o644); err != nil {
					t.Fatal(err)
				}
			}
			want, err := os.ReadFile(golden)
			if err != nil {
				t.Fatal(err)
			}
			if out != string(want) {
				t.Errorf("plan JSON differs from %s; run go test ./cmd/arcwright -update and read the diff", golden)
			}
		})
	}
}

// TestPlanWrites checks that plan writes every output, identically twice,
// and writes nothing when the input is bad.
func TestPlanWrites(t *testing.T) {
	dir := t.TempDir()
	files := func(tag string) []string {
		return []string{filepath.Join(dir, tag+".pdf"), filepath.Join(dir, tag+".csv"), filepath.Join(dir, tag+".json"), filepath.Join(dir, tag+".geojson")}
	}
	for _, tag := range []string{"a", "b"} {
		f := files(tag)
		o := &PlanOptions{Layout: demoDir + "/hard-wall-exhaust-room.yaml", PDF: f[0], CSV: f[1], JSON: f[2], GeoJSON: f[3], Format: "text"}
		var out bytes.Buffer
		if err := runPlan(o, &out); err != nil {
			t.Fatal(err)
		}
		for _, p := range f {
			if !strings.Contains(out.String(), "wrote "+p) {
				t.Errorf("summary does not mention %s", p)
			}
		}
	}
	for i, a := range files("a") {
		x, _ := os.ReadFile(a)
		y, _ := os.ReadFile(files("b")[i])
		if len(x) == 0 || !bytes.Equal(x, y) {
			t.Errorf("%s: %d bytes, differs from the second run: %v", a, len(x), !bytes.Equal(x, y))
		}
	}
	bad := filepath.Join(dir, "bad.pdf")
	if _, _, code := arc(t, "plan", "../../testdata/layouts/broken/unknown_key.yaml", "--pdf", bad); code != exitError {
		t.Errorf("broken layout: exit %d", code)
	}
	if _, _, code := arc(t, "plan", demoDir+"/anechoic-model-jet.yaml", "--pdf", bad, "--scale", "1:10"); code != exitError {
		t.Errorf("impossible scale: exit %d", code)
	}
	if _, _, code := arc(t, "plan", demoDir+"/anechoic-model-jet.yaml", "--csv", filepath.Join(dir, "c.csv"), "--pdf", filepath.Join(dir, "no-such-dir", "x.pdf")); code != exitError {
		t.Errorf("unwritable path: exit %d", code)
	}
	for _, p := range []string{bad, filepath.Join(dir, "c.csv")} {
		if _, err := os.Stat(p); err == nil {
			t.Errorf("%s was written by a failed run", p)
		}
	}
}

// TestCheck checks the exit statuses of check: 0 with nothing blocked, 3
// when an as-built position puts a stand in the jet, 1 on bad input.
func TestCheck(t *testing.T) {
	layoutPath := demoDir + "/anechoic-model-jet.yaml"
	out, errOut, code := arc(t, "check", layoutPath)
	if code != exitOK || !strings.Contains(out, "0 blocked") {
		t.Fatalf("planned positions: exit %d\n%s%s", code, out, errOut)
	}
	dir := t.TempDir()
	csvPath := filepath.Join(dir, "as-built.csv")
	// S-03 moved onto the jet axis, 1 m downstream of the exit (X 4.5 m, Y 3.5 m in this layout)
	os.WriteFile(csvPath, []byte("id,x,y,z\nS-03,5.5 m,3.5 m,1.8 m\n"), 0o644)
	out, errOut, code = arc(t, "check", layoutPath, "--as-built", csvPath)
	if code != exitBlocked || !strings.Contains(out, "S-03") || !strings.Contains(out, "blocked") {
		t.Errorf("as-built in the jet: exit %d\n%s%s", code, out, errOut)
	}
	// the station CSV that plan writes reads back as an as-built file
	exported := filepath.Join(dir, "stations.csv")
	if _, errOut, code := arc(t, "plan", layoutPath, "--csv", exported); code != 0 {
		t.Fatalf("plan --csv: %s", errOut)
	}
	out, errOut, code = arc(t, "check", layoutPath, "--as-built", exported)
	if code != exitOK || !strings.Contains(out, "as built, mic 0") {
		t.Errorf("exported CSV as as-built: exit %d\n%s%s", code, out, errOut)
	}
	os.WriteFile(csvPath, []byte("id,x,y,z\nZ-99,5 m,3 m,1 m\n"), 0o644)
	if _, errOut, code := arc(t, "check", layoutPath, "--as-built", csvPath); code != exitError || !strings.Contains(errOut, "Z-99") {
		t.Errorf("unknown station: exit %d, %q", code, errOut)
	}
	os.WriteFile(csvPath, []byte("id,x,y,z\nS-03,5 kg,3 m,1 m\n"), 0o644)
	if _, errOut, code := arc(t, "check", layoutPath, "--as-built", csvPath); code != exitError || !strings.Contains(errOut, "as-built.csv:2") {
		t.Errorf("bad unit: exit %d, %q", code, errOut)
	}
}
