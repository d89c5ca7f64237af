package main

import (
	"bufio"
	"bytes"
	"context"
	"errors"
	"fmt"
	"io"
	"net/http"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"sync"
	"syscall"
	"testing"
	"time"
)

func TestListenAddr(t *testing.T) {
	for _, tc := range []struct {
		in, want string
		loopback bool
		usage    bool
	}{
		{in: "127.0.0.1:8570", want: "127.0.0.1:8570", loopback: true},
		{in: ":0", want: "127.0.0.1:0", loopback: true},
		{in: "localhost:9000", want: "localhost:9000", loopback: true},
		{in: "[::1]:0", want: "[::1]:0", loopback: true},
		{in: "0.0.0.0:8570", want: "0.0.0.0:8570"},
		{in: "192.168.1.20:80", want: "192.168.1.20:80"},
		{in: "8570", usage: true},
		{in: "host:port", usage: true},
		{in: "127.0.0.1:70000", usage: true},
	} {
		t.Run(tc.in, func(t *testing.T) {
			got, loop, err := listenAddr(tc.in)
			var ue usageError
			if tc.usage {
				if !errors.As(err, &ue) || !strings.Contains(err.Error(), "--addr") {
					t.Fatalf("got %v, want a usage error naming --addr", err)
				}
				return
			}
			if err != nil || got != tc.want || loop != tc.loopback {
				t.Errorf("got %q loopback %v (%v), want %q loopback %v", got, loop, err, tc.want, tc.loopback)
			}
		})
	}
}

// syncBuffer is a bytes.Buffer safe for one writer and one reader.
type syncBuffer struct {
	mu sync.Mutex
	b  bytes.Buffer
}

func (s *syncBuffer) Write(p []byte) (int, error) {
	s.mu.Lock()
	defer s.mu.Unlock()
	return s.b.Write(p)
}

func (s *syncBuffer) String() string {
	s.mu.Lock()
	defer s.mu.Unlock()
	return s.b.String()
}

// startServe runs serve on a copy of the demo at a free loopback port and
// returns the URL it printed, its standard error, and a function that
// stops it and returns its error.
func startServe(t *testing.T, run func(ctx context.Context, stdout, stderr io.Writer) error) (string, *syncBuffer, func() error) {
	t.Helper()
	pr, pw := io.Pipe()
	stderr := &syncBuffer{}
	ctx, cancel := context.WithCancel(context.Background())
	done := make(chan error, 1)
	go func() {
		err := run(ctx, pw, stderr)
		pw.Close()
		done <- err
	}()
	first, err := bufio.NewReader(pr).ReadString('\n')
	if err != nil {
		cancel()
		t.Fatalf("reading the first line: %v (stderr %q)", err, stderr.String())
	}
	go io.Copy(io.Discard, pr)
	m := regexp.MustCompile(`^serving (http://127\.0\.0\.1:[0-9]+/)\n$`).FindStringSubmatch(first)
	if m == nil {
		cancel()
		t.Fatalf("got first line %q, want 'serving http://127.0.0.1:PORT/'", first)
	}
	stop := func() error {
		cancel()
		select {
		case err := <-done:
			return err
		case <-time.After(10 * time.Second):
			t.Fatal("serve did not stop within 10 s")
			return nil
		}
	}
	t.Cleanup(func() { cancel() })
	return m[1], stderr, stop
}

func TestServe(t *testing.T) {
	path := copyDemo(t, t.TempDir())
	o := &ServeOptions{Layout: path, Addr: ":0"}
	url, stderr, stop := startServe(t, func(ctx context.Context, stdout, stderr io.Writer) error {
		return runServe(ctx, o, stdout, stderr)
	})
	for _, p := range []string{"", "plan.json", "plan.svg", "sheet.pdf"} {
		res, err := http.Get(url + p)
		if err != nil {
			t.Fatal(err)
		}
		res.Body.Close()
		if res.StatusCode != http.StatusOK {
			t.Errorf("GET /%s: got %d, want 200", p, res.StatusCode)
		}
	}
	// an open event stream does not hold the server up
	res, err := http.Get(url + "events")
	if err != nil {
		t.Fatal(err)
	}
	defer res.Body.Close()
	if err := stop(); err != nil {
		t.Errorf("stopping: got %v, want nil", err)
	}
	if e := stderr.String(); strings.Contains(e, "warning") || !strings.Contains(e, "stopped") {
		t.Errorf("stderr: %q", e)
	}
}

// A layout with problems is served all the same; its problems are printed
// with their lines, as the other commands print them.
func TestServeBadLayout(t *testing.T) {
	path := copyDemo(t, t.TempDir())
	data, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(path, bytes.Replace(data, []byte("diameter: 50.8 mm"), []byte("diameter: 50.8 kg"), 1), 0o644); err != nil {
		t.Fatal(err)
	}
	o := &ServeOptions{Layout: path, Addr: ":0"}
	url, stderr, stop := startServe(t, func(ctx context.Context, stdout, stderr io.Writer) error {
		return runServe(ctx, o, stdout, stderr)
	})
	res, err := http.Get(url + "plan.json")
	if err != nil {
		t.Fatal(err)
	}
	res.Body.Close()
	if res.StatusCode != http.StatusUnprocessableEntity {
		t.Errorf("got %d, want 422", res.StatusCode)
	}
	if err := stop(); err != nil {
		t.Error(err)
	}
	if e := stderr.String(); !regexp.MustCompile(regexp.QuoteMeta(path)+`:[0-9]+: nozzle\.diameter: .*kg`).MatchString(e) || !strings.Contains(e, "1 problem;") {
		t.Errorf("stderr %q lacks the problem with its line and key", e)
	}
}

// SIGTERM (and Ctrl-C's SIGINT) stop the command cleanly with exit 0.
func TestServeSignal(t *testing.T) {
	path := copyDemo(t, t.TempDir())
	_, stderr, stop := startServe(t, func(ctx context.Context, stdout, stderr io.Writer) error {
		code := run([]string{"serve", path, "--addr", ":0"}, stdout, stderr)
		if code != exitOK {
			return fmt.Errorf("exit status %d", code)
		}
		return nil
	})
	if err := syscall.Kill(os.Getpid(), syscall.SIGTERM); err != nil {
		t.Fatal(err)
	}
	deadline := time.Now().Add(10 * time.Second)
	for !strings.Contains(stderr.String(), "stopped") {
		if time.Now().After(deadline) {
			t.Fatalf("no 'stopped' within 10 s of SIGTERM; stderr %q", stderr.String())
		}
		time.Sleep(20 * time.Millisecond)
	}
	if err := stop(); err != nil {
		t.Error(err)
	}
	if strings.Contains(stderr.String(), "goroutine") {
		t.Errorf("a stack trace on stop: %q", stderr.String())
	}
}

func TestServeErrors(t *testing.T) {
	for _, tc := range []struct {
		args []string
		code int
		want string
	}{
		{[]string{"serve"}, exitUsage, "needs the layout file"},
		{[]string{"serve", "a.yaml", "b.yaml"}, exitUsage, "one layout file"},
		{[]string{"serve", filepath.Join(demoDir, "anechoic-model-jet.yaml"), "--addr", "nonsense"}, exitUsage, "--addr"},
		{[]string{"serve", filepath.Join(t.TempDir(), "missing.yaml"), "--addr", ":0"}, exitError, "cannot read the layout file"},
		{[]string{"serve", t.TempDir(), "--addr", ":0"}, exitError, "is a folder"},
	} {
		t.Run(strings.Join(tc.args, " "), func(t *testing.T) {
			out, errOut, code := arc(t, tc.args...)
			if code != tc.code || !strings.Contains(errOut, tc.want) || out != "" {
				t.Errorf("got exit %d, stdout %q, stderr %q; want exit %d and %q", code, out, errOut, tc.code, tc.want)
			}
		})
	}
}
