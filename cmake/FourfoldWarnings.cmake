# fourfold_warnings(target): the project's warning set, applied per target.
function(fourfold_warnings target)
  target_compile_options(${target} PRIVATE -Wall -Wextra -Wshadow -Wconversion -Wno-sign-conversion)
  if(FOURFOLD_WERROR)
    target_compile_options(${target} PRIVATE -Werror)
  endif()
endfunction()
