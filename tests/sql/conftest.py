"""A PostgreSQL server for the SQL tests that run on real engines.

With ``NLNORM_TEST_PG_DSN`` set, the tests connect to that server. Otherwise a throwaway cluster
is made in a temporary directory (owned by the ``postgres`` user when the tests run as root,
since initdb refuses root), started on a free port of 127.0.0.1 and removed at the end of the
session. Without server binaries the PostgreSQL tests are skipped with a message saying how to
install them; with ``NLNORM_REQUIRE_PG=1`` (as ``.ci/run`` sets) they fail instead.
"""

from __future__ import annotations

import glob
import os
import pwd
import shutil
import socket
import subprocess
import tempfile
from collections.abc import Iterator
from pathlib import Path
from typing import NoReturn

import pytest

_INSTALL_HINT = ("install the PostgreSQL server (Debian/Ubuntu: `apt-get install postgresql`; "
                 "`.ci/run` does it), or point NLNORM_TEST_PG_DSN at a server you may create "
                 "tables on")


def _server_bin_dir() -> Path | None:
    """The directory holding initdb and pg_ctl: Debian's /usr/lib/postgresql/<v>/bin (newest
    first), else the PATH."""
    def version(path: str) -> tuple[int, ...]:
        part = Path(path).parent.name
        return tuple(int(p) for p in part.split(".") if p.isdigit())

    for bin_dir in sorted(glob.glob("/usr/lib/postgresql/*/bin"), key=version, reverse=True):
        if (Path(bin_dir) / "initdb").is_file() and (Path(bin_dir) / "pg_ctl").is_file():
            return Path(bin_dir)
    initdb, pg_ctl = shutil.which("initdb"), shutil.which("pg_ctl")
    if initdb and pg_ctl and Path(initdb).parent == Path(pg_ctl).parent:
        return Path(initdb).parent
    return None


def _free_port() -> int:
    with socket.socket(socket.AF_INET, socket.SOCK_STREAM) as s:
        s.bind(("127.0.0.1", 0))
        return int(s.getsockname()[1])


def _unavailable(reason: str) -> NoReturn:
    """Skip, or fail when NLNORM_REQUIRE_PG=1: never a silent skip."""
    message = f"PostgreSQL tests need a server: {reason}; {_INSTALL_HINT}"
    if os.environ.get("NLNORM_REQUIRE_PG") == "1":
        pytest.fail(f"NLNORM_REQUIRE_PG=1 and {message}", pytrace=False)
    pytest.skip(message)


class _Cluster:
    """A temporary cluster: made, started, stopped and removed."""

    def __init__(self, bin_dir: Path) -> None:
        self.bin_dir = bin_dir
        as_root = os.geteuid() == 0
        # As root the server runs as "postgres", which must reach the directory: /tmp is open
        # to every user, a root-only TMPDIR may not be.
        self.root = Path(tempfile.mkdtemp(prefix="nlnorm-pg-", dir="/tmp" if as_root else None))
        self.data = self.root / "data"
        self.sockets = self.root / "sockets"
        self.log = self.root / "server.log"
        self.port = _free_port()
        self.user: str | None = None
        if as_root:
            try:
                entry = pwd.getpwnam("postgres")
            except KeyError:
                shutil.rmtree(self.root, ignore_errors=True)
                _unavailable("the tests run as root, initdb refuses root, and there is no "
                             "'postgres' user to run the server as")
            self.user = "postgres"
            self.root.chmod(0o700)
            os.chown(self.root, entry.pw_uid, entry.pw_gid)
        self._run_as_owner(["mkdir", "-p", str(self.sockets)])

    def _run_as_owner(self, argv: list[str]) -> subprocess.CompletedProcess[str]:
        if self.user is not None:
            argv = ["runuser", "-u", self.user, "--", *argv]
        return subprocess.run(argv, cwd=self.root, capture_output=True, text=True, check=False)

    def _checked(self, argv: list[str], what: str) -> None:
        done = self._run_as_owner(argv)
        if done.returncode != 0:
            log = self.log.read_text(errors="replace") if self.log.exists() else ""
            raise RuntimeError(f"{what} failed ({done.returncode}): {done.stdout}{done.stderr}{log}")

    def start(self) -> str:
        self._checked([str(self.bin_dir / "initdb"), "-D", str(self.data), "-U", "postgres",
                       "-A", "trust", "-E", "UTF8", "--locale=C", "--no-sync"], "initdb")
        options = (f"-p {self.port} -k {self.sockets} -c listen_addresses=127.0.0.1 "
                   "-c fsync=off -c synchronous_commit=off -c full_page_writes=off")
        self._checked([str(self.bin_dir / "pg_ctl"), "-D", str(self.data), "-l", str(self.log),
                       "-o", options, "-w", "-t", "60", "start"], "pg_ctl start")
        return f"host=127.0.0.1 port={self.port} user=postgres dbname=postgres"

    def stop(self) -> None:
        try:
            if (self.data / "postmaster.pid").exists():
                self._run_as_owner([str(self.bin_dir / "pg_ctl"), "-D", str(self.data),
                                    "-m", "fast", "-w", "stop"])
        finally:
            shutil.rmtree(self.root, ignore_errors=True)


@pytest.fixture(scope="session")
def pg_dsn() -> Iterator[str]:
    """The DSN of a PostgreSQL server the tests may create tables on."""
    given = os.environ.get("NLNORM_TEST_PG_DSN")
    if given:
        yield given
        return
    bin_dir = _server_bin_dir()
    if bin_dir is None:
        _unavailable("no initdb/pg_ctl under /usr/lib/postgresql/*/bin or on the PATH")
    cluster = _Cluster(bin_dir)
    try:
        dsn = cluster.start()
    except Exception as error:
        cluster.stop()
        raise RuntimeError(f"could not start a temporary PostgreSQL server: {error}") from error
    try:
        yield dsn
    finally:
        cluster.stop()
