package designfile

import (
	"bufio"
	"flag"
	"fmt"
	"math/rand/v2"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"syscall"
	"testing"
	"time"
)

// kills is the number of kill -9 interruptions TestKilledSaves makes. The
// default keeps the suite fast; the full check is
//
//	go test ./hazards/designfile -run TestKilledSaves -kills 1000 -v
var kills = flag.Int("kills", 20, "kill -9 interruptions of a save loop in TestKilledSaves")

// writersFor is how long TestTwoWriters lets two processes save the same
// file at once.
var writersFor = flag.Duration("writers-for", time.Second, "how long two processes save the same file in TestTwoWriters")

// saveLoopEnv names the file a child process saves over and over.
const saveLoopEnv = "ULLAGE_TEST_SAVE_LOOP"

// TestSaveLoopChild is the child process of the kill tests: it saves the
// file named by saveLoopEnv in a loop, with content of changing length,
// until it is killed. Run on its own it does nothing.
func TestSaveLoopChild(t *testing.T) {
	path := os.Getenv(saveLoopEnv)
	if path == "" {
		t.Skip("the child of TestKilledSaves and TestTwoWriters")
	}
	f := typicalFile()
	for i := 0; ; i++ {
		f.Product.Description = strings.Repeat("x", i%997)
		if err := Save(path, f); err != nil {
			fmt.Fprintln(os.Stderr, err)
			os.Exit(3)
		}
		if i == 0 {
			fmt.Println("saving")
		}
	}
}

// startSaveLoop starts a child that saves path in a loop and returns once
// it has saved at least once.
func startSaveLoop(t *testing.T, path string) *exec.Cmd {
	t.Helper()
	cmd := exec.Command(os.Args[0], "-test.run=^TestSaveLoopChild$")
	cmd.Env = append(os.Environ(), saveLoopEnv+"="+path)
	out, err := cmd.StdoutPipe()
	if err != nil {
		t.Fatal(err)
	}
	cmd.Stderr = os.Stderr
	if err := cmd.Start(); err != nil {
		t.Fatal(err)
	}
	if line, err := bufio.NewReader(out).ReadString('\n'); err != nil || line != "saving\n" {
		cmd.Process.Kill()
		cmd.Wait()
		t.Fatalf("child did not start saving: %q, %v", line, err)
	}
	return cmd
}

// ourTemporaries lists the files of this package's temporary naming
// beside path.
func ourTemporaries(t *testing.T, path string) []string {
	t.Helper()
	var out []string
	for _, name := range listDir(t, filepath.Dir(path)) {
		if strings.HasPrefix(name, "."+filepath.Base(path)+".") {
			out = append(out, name)
		}
	}
	return out
}

// TestKilledSaves kills a process that saves a design file in a loop at
// random moments: after every kill the file and its backup load, and the
// next save leaves no temporary file behind.
func TestKilledSaves(t *testing.T) {
	if testing.Short() {
		t.Skip("starts child processes")
	}
	dir := t.TempDir()
	path := filepath.Join(dir, "killed.json")
	if err := Save(path, typicalFile()); err != nil {
		t.Fatal(err)
	}
	corrupt, leftovers, caught := 0, 0, 0
	start := time.Now()
	for i := 0; i < *kills; i++ {
		cmd := startSaveLoop(t, path)
		time.Sleep(time.Duration(rand.Int64N(int64(15 * time.Millisecond))))
		cmd.Process.Signal(syscall.SIGKILL)
		cmd.Wait()
		if len(ourTemporaries(t, path)) > 0 {
			caught++ // killed part way through a save
		}
		for _, p := range []string{path, path + BackupSuffix} {
			if _, err := Load(p); err != nil {
				corrupt++
				t.Errorf("kill %d: %s does not load: %v", i, filepath.Base(p), err)
			}
		}
		if err := Save(path, typicalFile()); err != nil {
			t.Fatalf("kill %d: the next save: %v", i, err)
		}
		if tmp := ourTemporaries(t, path); len(tmp) > 0 {
			leftovers += len(tmp)
			t.Errorf("kill %d: the next save left %v", i, tmp)
		}
	}
	t.Logf("%d kills in %v: %d while a temporary file existed, %d corrupt files, %d temporaries left after the next save",
		*kills, time.Since(start).Round(time.Millisecond), caught, corrupt, leftovers)
}

// TestTwoWriters lets two processes save the same file at once (which
// makes the backup a hard link of the file now and then), kills both,
// and checks that one more save leaves the file, its backup and nothing
// else.
func TestTwoWriters(t *testing.T) {
	if testing.Short() {
		t.Skip("starts child processes")
	}
	dir := t.TempDir()
	path := filepath.Join(dir, "shared.json")
	if err := Save(path, typicalFile()); err != nil {
		t.Fatal(err)
	}
	a, b := startSaveLoop(t, path), startSaveLoop(t, path)
	time.Sleep(*writersFor)
	for _, c := range []*exec.Cmd{a, b} {
		c.Process.Signal(syscall.SIGKILL)
		c.Wait()
	}
	if err := Save(path, typicalFile()); err != nil {
		t.Fatal(err)
	}
	if got := listDir(t, dir); strings.Join(got, " ") != "shared.json shared.json.bak" {
		t.Errorf("after two writers and one more save the folder holds %v", got)
	}
	for _, p := range []string{path, path + BackupSuffix} {
		if _, err := Load(p); err != nil {
			t.Errorf("%s: %v", filepath.Base(p), err)
		}
	}
}
