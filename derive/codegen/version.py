"""The generator's version, kept apart so every codegen module can import it without a circle."""

#: bump when the emitted code changes for the same formulation (part of every header)
GENERATOR_VERSION = "1.0"
