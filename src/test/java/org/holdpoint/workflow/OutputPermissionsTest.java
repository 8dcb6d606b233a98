package org.holdpoint.workflow;

import org.holdpoint.files.AtomicFiles;
import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Outputs get the permissions any program's new file gets under the user's umask (so a workbook saved
 * to a shared folder can be opened by the others); only a private key is readable by its owner alone.
 */
class OutputPermissionsTest {

    private static Set<PosixFilePermission> perms(Path p) throws Exception {
        return Files.getPosixFilePermissions(p);
    }

    @Test
    void outputsFollowTheUmaskAndPrivateKeysAreOwnerOnly(@TempDir Path dir) throws Exception {
        assumeTrue(dir.getFileSystem().supportedFileAttributeViews().contains("posix"), "POSIX permissions only");
        Path plain = Files.createFile(dir.resolve("any-new-file.txt"));
        Path json = dir.resolve("result.json");
        AtomicFiles.writeText(json, "{}");
        assertThat(perms(json)).isEqualTo(perms(plain));
        Path key = dir.resolve("signer.pem");
        Path pub = dir.resolve("signer.pub.pem");
        RecordSigning.generate(key, pub);
        assertThat(perms(key)).isEqualTo(PosixFilePermissions.fromString("rw-------"));
        assertThat(perms(pub)).isEqualTo(perms(plain));
        try (var files = Files.list(dir)) {
            assertThat(files.map(p -> p.getFileName().toString())).noneMatch(n -> n.endsWith(".part"));
        }
    }
}
